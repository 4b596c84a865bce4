import { screen, within } from '@testing-library/react';
import { PlanLatestRun } from '../../../components/plans/plan-latest-run';
import type { RunView } from '../../../shared/run-view';
import { RUNNING_RUN } from '../../setup/running-run';
import { mockFetchRoutes } from '../../setup/mock-fetch-routes';
import { renderWithClient } from '../../setup/render-with-client';

jest.mock('expo-router', () => require('../../setup/expo-router-stub'));

const PLAN = 'a1b2c3d4-0000-4000-8000-000000000001';
// Every judged point passed; two checks (a library without the suite's function) checked nothing.
const STOPPED: RunView = {
  ...RUNNING_RUN,
  planId: PLAN,
  status: 'completed',
  shardsDone: 4,
  counts: { pass: 480, fail: 0, error: 0, skipped: 308, notApplicable: 0 },
  checksStopped: 2,
  checksFailed: 0,
  finishedAt: '2026-03-01T02:41:00Z',
};

describe('PlanLatestRun', () => {
  it('shows the plan’s newest run with the verdict of the runs list, stopped checks counted in words', async () => {
    const calls = mockFetchRoutes(() => ({ body: { runs: [STOPPED], next: null } }));
    renderWithClient(<PlanLatestRun planId={PLAN} planName="complex.js nightly" />);
    const card = await screen.findByTestId(`run-${STOPPED.id}`);
    expect(within(card).getByText('◊ completed with errors')).toBeTruthy();
    expect(within(card).getByText('2 checks stopped by an error')).toBeTruthy();
    expect(card.getAttribute('href')).toBe(`/runs/${STOPPED.id}`);
    expect(calls.map((c) => c.url)).toEqual([`/api/runs?plan=${PLAN}&limit=1`]);
    expect(screen.getByRole('link', { name: 'All runs of this plan, complex.js nightly' }).getAttribute('href')).toBe(
      `/runs?plan=${PLAN}`,
    );
  });

  it('says a plan never run has checked nothing', async () => {
    mockFetchRoutes(() => ({ body: { runs: [], next: null } }));
    renderWithClient(<PlanLatestRun planId={PLAN} planName="complex.js nightly" />);
    expect(await screen.findByText('− Not run yet: nothing checked for this plan.')).toBeTruthy();
  });
});
