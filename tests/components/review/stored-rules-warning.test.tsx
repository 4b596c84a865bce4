import { render, screen } from '@testing-library/react';
import { StoredRulesWarning } from '../../../components/review/stored-rules-warning';
import type { Suite } from '../../../shared/schemas/suite-schema';
import sqrtDemo from '../../../suites/demo/sqrt-principal-sz.json';

const withFirstRadius = (radius: string) =>
  ({
    ...sqrtDemo,
    paths: [
      { kind: 'circle', name: 'unit circle', center: { re: '0', im: '0' }, radius, samples: 16 },
      ...sqrtDemo.paths.slice(1),
    ],
  }) as unknown as Suite;

describe('StoredRulesWarning', () => {
  it('tells the reviewer a stored circle of radius -1 cannot be approved, naming "Path 1 · radius"', () => {
    render(<StoredRulesWarning body={withFirstRadius('-1')} />);
    const warning = screen.getByTestId('stored-rules-warning').textContent ?? '';
    expect(warning).toContain('cannot be approved; request changes');
    expect(warning).toContain('Path 1 · radius must be greater than 0: with -1 the circle has no points');
  });

  it('says nothing of a version that meets today’s rules', () => {
    render(<StoredRulesWarning body={withFirstRadius('1')} />);
    expect(screen.queryByTestId('stored-rules-warning')).toBeNull();
  });
});
