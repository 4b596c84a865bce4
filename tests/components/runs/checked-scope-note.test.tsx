import { render, screen } from '@testing-library/react';
import { CheckedScopeNote } from '../../../components/runs/checked-scope-note';
import type { CheckedScope } from '../../../shared/run-result';

const scope = (over: Partial<CheckedScope>): CheckedScope => ({
  convention: 'signed-zero',
  branch: 'principal',
  tolerance: '4 ulps',
  paths: 3,
  points: 120,
  properties: { listed: ['conjugate-symmetry'], run: true, note: '' },
  ...over,
});

describe('CheckedScopeNote', () => {
  it('states the conventions, paths, points and properties behind the result, and that green is evidence for those points only', () => {
    render(
      <CheckedScopeNote
        scopes={[
          scope({}),
          scope({
            convention: 'counter-clockwise',
            paths: 2,
            points: 1000,
            tolerance: '1e-12 relative',
            branch: 'the regular branch of (z^2 - 1)^(1/2) with k = 0 at z0 = 2 + 0i, cut along 1 cut(s)',
          }),
        ]}
        properties={{ held: 3, failed: 1, notChecked: 2 }}
      />,
    );
    expect(
      screen.getByText('• 2 checks of a suite against a library version, 5 paths, 1,120 points in all.'),
    ).toBeTruthy();
    expect(
      screen.getByText('• Conventions: signed zero (IEC 60559 / ISO C Annex G); counter-clockwise continuity.'),
    ).toBeTruthy();
    expect(
      screen.getByText(
        '• Branches: principal branches (1 check); regular branches fixed by a value at a point and continued along the paths (1 check).',
      ),
    ).toBeTruthy();
    expect(screen.getByText('• Tolerances: 4 ulps; 1e-12 relative.')).toBeTruthy();
    expect(
      screen.getByText('• Property checks: 4 laws run on drawn points (3 held, 1 failed), 2 not checked.'),
    ).toBeTruthy();
    expect(
      screen.getByText(
        'A green matrix is evidence for these 1,120 points under these conventions only — not a certificate that the library is right everywhere.',
      ),
    ).toBeTruthy();
  });

  it('counts the checks that checked nothing and the property laws listed but not run', () => {
    render(
      <CheckedScopeNote
        scopes={[scope({ properties: { listed: ['range'], run: false, note: 'no property for this target' } })]}
        checksNotChecked={3}
        subject="table"
      />,
    );
    expect(
      screen.getByText('• 3 checks of this run checked nothing (not finished, cancelled, or stopped by an error).'),
    ).toBeTruthy();
    expect(screen.getByText('• 1 check listed property laws that were not run.')).toBeTruthy();
    expect(screen.getByText('What this table shows, and what it does not')).toBeTruthy();
  });

  it('says nothing has been checked when no check has finished', () => {
    render(<CheckedScopeNote scopes={[]} checksNotChecked={4} />);
    expect(
      screen.getByText(
        '• No check of a suite against a library version has finished, so nothing has been checked yet.',
      ),
    ).toBeTruthy();
    expect(screen.getByText(/evidence for these 0 points/)).toBeTruthy();
  });
});
