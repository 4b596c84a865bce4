import { render, screen } from '@testing-library/react';
import { SuiteFacts } from '../../../components/suites/suite-facts';
import { suiteSchema } from '../../../shared/schemas/suite-schema';
import finiteCut from '../../../suites/demo/sqrt-z2-minus-1-finite-cut.json';

describe('SuiteFacts', () => {
  it('sets a regular branch as maths: (z² − 1) with ½ raised, never "(z^2 - 1)^1/2"', () => {
    render(<SuiteFacts suite={suiteSchema.parse(finiteCut)} />);
    const branch = screen.getByText('Branch').parentElement!;
    expect(branch.textContent).toBe('Branchregular branch of (z2 − 1)1/2');
    const raised = Array.from(branch.querySelectorAll('span')).filter((s) => s.style.verticalAlign === 'top');
    expect(raised.map((s) => s.textContent)).toEqual(['2', '1/2']);
    const fixedBy = screen.getByText('Fixed by').parentElement!;
    expect(fixedBy.textContent).toMatch(/^Fixed byvalue k = 0 at z0 = 2 \+ 0i \(the principal value times e2πiνk\)$/);
    expect(fixedBy.textContent).not.toContain('^');
  });
});
