import { render, screen } from '@testing-library/react';
import { VersionHistory } from '../../../components/suites/version-history';
import type { SuiteVersionView } from '../../../shared/suite-version-view';

const version = (over: Partial<SuiteVersionView>): SuiteVersionView =>
  ({
    id: 'v1',
    suiteId: 's',
    slug: 'sqrt-demo',
    version: 1,
    status: 'submitted',
    body: {},
    author: { id: 'o', displayName: 'Odile Marchetti' },
    takenOverFrom: null,
    reviewer: null,
    reviewComment: null,
    createdAt: '2026-12-01T10:00:00Z',
    submittedAt: null,
    reviewedAt: null,
    ...over,
  }) as SuiteVersionView;

describe('VersionHistory', () => {
  it('names both the author and whose draft they took over when someone edited another person’s draft', () => {
    render(
      <VersionHistory
        versions={[version({ takenOverFrom: { id: 'r', displayName: 'Ravi Dutta' } })]}
        selected={1}
        onSelect={() => undefined}
      />,
    );
    expect(screen.getByText(/written by Odile Marchetti, who took over Ravi Dutta's draft ·/)).toBeTruthy();
  });

  it('names only the author of a version one person wrote', () => {
    render(<VersionHistory versions={[version({})]} selected={1} onSelect={() => undefined} />);
    expect(screen.getByText(/^written by Odile Marchetti ·/)).toBeTruthy();
    expect(screen.queryByText(/took over/)).toBeNull();
  });
});
