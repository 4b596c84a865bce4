import { render, screen, within } from '@testing-library/react';
import { PlanLatestCard } from '../../../components/overview/plan-latest-card';
import type { OverviewView } from '../../../shared/overview-view';
import type { RunComparison } from '../../../shared/run-comparison';
import { RUNNING_RUN } from '../../setup/running-run';

jest.mock('expo-router', () => require('../../setup/expo-router-stub'));

type Plan = OverviewView['plans'][number];
const NOW = Date.parse('2026-03-02T09:00:00Z');

const COMPLETED = {
  ...RUNNING_RUN,
  id: 'c0000000-0000-4000-8000-000000000031',
  status: 'completed' as const,
  shardsDone: 19,
  shardsTotal: 19,
  counts: { pass: 5200, fail: 1311, error: 0, skipped: 0, notApplicable: 0 },
  byClass: { branch: 1200, accuracy: 111 },
  regressions: 31,
  createdAt: '2026-03-02T02:30:00Z',
  finishedAt: '2026-03-02T02:41:00Z',
};
const CANCELLED = {
  ...RUNNING_RUN,
  id: 'c0000000-0000-4000-8000-00000000000c',
  status: 'cancelled' as const,
  shardsDone: 2,
  shardsTotal: 19,
  counts: { pass: 300, fail: 131, error: 0, skipped: 0, notApplicable: 0 },
  createdAt: '2026-03-02T08:00:00Z',
  finishedAt: '2026-03-02T08:02:00Z',
};
const SAME_PAIRS: RunComparison = {
  previous: { id: 'p', finishedAt: '2026-03-01T02:41:00Z' },
  common: { pairs: 19, fail: 31, error: 0 },
  targetsAdded: { targets: [], fail: 0, error: 0 },
  targetsRemoved: { targets: [], fail: 0, error: 0 },
  suitesAdded: { slugs: [], fail: 0, error: 0 },
  suitesRemoved: { slugs: [], fail: 0, error: 0 },
};
const plan = (over: Partial<Plan>): Plan => ({
  planId: 'p1',
  planName: 'complex.js nightly',
  completed: COMPLETED,
  comparison: SAME_PAIRS,
  newer: null,
  ...over,
});

describe('PlanLatestCard', () => {
  it('keeps the completed run’s regressions as a link beside a newer cancelled run, and says what the cancelled run is', () => {
    render(<PlanLatestCard plan={plan({ newer: CANCELLED })} now={NOW} />);
    const link = screen.getByRole('link', {
      name: '↑ 31 regressions since the previous completed run: open them in the failure table',
    });
    expect(link.getAttribute('href')).toBe(`/failures?run=${COMPLETED.id}&status=new`);
    const newer = screen.getByTestId('plan-complex.js nightly-newer');
    expect(newer.textContent).toContain(
      'A newer run was cancelled 58 min ago with 2 of 19 suite × target pairs done: a cancelled run is not compared with anything, so its counts are partial and say nothing about regressions.',
    );
    expect(
      within(newer).getByRole('link', { name: 'Open the cancelled run: the newer run of complex.js nightly' }),
    ).toBeTruthy();
    // The cancelled run's counts are never compared with the completed run's.
    expect(screen.queryByText(/fewer failed/)).toBeNull();
  });

  it('says a running newer run is counted when it completes', () => {
    render(<PlanLatestCard plan={plan({ newer: { ...RUNNING_RUN, shardsTotal: 19, shardsDone: 5 } })} now={NOW} />);
    expect(screen.getByTestId('plan-complex.js nightly-newer').textContent).toContain(
      'A newer run is running (5 of 19 suite × target pairs done): its regressions are counted when it completes.',
    );
  });

  it('says "first run of this plan to complete" instead of a count of zero regressions', () => {
    render(<PlanLatestCard plan={plan({ completed: { ...COMPLETED, regressions: null }, comparison: null })} />);
    expect(screen.getByText('First run of this plan to complete: nothing to compare with.')).toBeTruthy();
    expect(screen.queryByText(/since the previous completed run/)).toBeNull();
  });

  it('explains a change of the target set instead of an unexplained rise in failures', () => {
    const comparison: RunComparison = {
      ...SAME_PAIRS,
      common: { pairs: 19, fail: -2, error: 0 },
      targetsAdded: { targets: ['cmath', 'mathjs/complex', 'numpy'], fail: 604, error: 0 },
      targetsRemoved: { targets: ['math'], fail: 20, error: 1 },
    };
    render(<PlanLatestCard plan={plan({ comparison })} />);
    expect(
      screen.getByText(
        'On the 19 suite × target pairs both runs checked, since the previous completed run: ↓ 2 fewer failed.',
      ),
    ).toBeTruthy();
    expect(
      screen.getByText(
        '3 targets added since the previous run (cmath, mathjs/complex, numpy): 604 more failures come from them.',
      ),
    ).toBeTruthy();
    expect(
      screen.getByText(
        '1 target no longer checked (math): the 20 failures and 1 point in error it had in the previous run are left out of the comparison.',
      ),
    ).toBeTruthy();
    expect(screen.queryByText(/↑ 604/)).toBeNull();
  });

  it('says no run has completed when the only run was cancelled', () => {
    render(<PlanLatestCard plan={plan({ completed: null, comparison: null, newer: CANCELLED })} now={NOW} />);
    expect(screen.getByText('No run of this plan has completed yet: nothing to compare with.')).toBeTruthy();
    expect(screen.getByTestId('plan-complex.js nightly-newer')).toBeTruthy();
  });
});
