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

  it('names each formula by its spoken form, not by the flat "(z2 − 1)1/2" of its raised pieces', () => {
    render(<SuiteFacts suite={suiteSchema.parse(finiteCut)} />);
    expect(
      screen.getByRole('math', {
        name: 'regular branch of open bracket z squared minus 1 close bracket to the power one half',
      }),
    ).toBeTruthy();
    expect(
      screen.getByRole('math', {
        name: 'the square root of open bracket z minus 1 close bracket times the square root of open bracket z plus 1 close bracket',
      }).textContent,
    ).toBe('sqrt(z - 1) * sqrt(z + 1)');
    expect(
      screen.getByRole('math', {
        name: 'value k equals 0 at z sub 0 equals 2 plus 0 i (the principal value times e to the power 2 pi i nu k end exponent)',
      }),
    ).toBeTruthy();
  });
});
