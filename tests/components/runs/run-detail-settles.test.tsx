import { act, screen, waitFor } from '@testing-library/react';
import { RunDetail } from '../../../components/runs/run-detail';
import type { RunMatrixCell } from '../../../shared/run-matrix-cell';
import type { RunView } from '../../../shared/run-view';
import { mockFetchRoutes } from '../../setup/mock-fetch-routes';
import { renderWithClient } from '../../setup/render-with-client';
import { RUNNING_RUN } from '../../setup/running-run';

jest.mock('expo-router', () => require('../../setup/expo-router-stub'));

const SUITES = ['sqrt-principal-sz', 'log-principal-sz', 'acos-principal-sz'];
const TARGET = 'complex.js@2.4.3';

const cell = (suite: string, done: boolean): RunMatrixCell => ({
  suite,
  target: TARGET,
  status: done ? 'done' : 'queued',
  outcome: done ? 'pass' : null,
  counts: done ? { pass: 40, fail: 0, error: 0, skipped: 0, notApplicable: 0 } : null,
  byClass: done ? { branch: 0, accuracy: 0 } : null,
  byDiagnosis: done ? {} : null,
  checked: done
    ? {
        convention: 'signed-zero',
        branch: 'principal',
        tolerance: '4 ulps',
        paths: 2,
        points: 40,
        properties: { listed: [], run: true, note: '' },
      }
    : null,
  skipReasons: [],
  errors: [],
  worker: done ? 'build-7:4121' : null,
  noWorkerHasTarget: false,
  lawsFailed: 0,
  loopsFailed: [],
});

/**
 * The server as the run page meets it: one pair done at first, and after `finish()` every pair
 * done and the run completed. The run is polled every 1.5 s and its matrix every 2.5 s, so the
 * page sees the run end before its matrix poll would come round.
 */
function fakeServer() {
  let finished = false;
  const run = (): RunView => ({
    ...RUNNING_RUN,
    status: finished ? 'completed' : 'running',
    shardsTotal: SUITES.length,
    shardsDone: finished ? SUITES.length : 1,
    counts: { pass: finished ? 120 : 40, fail: 0, error: 0, skipped: 0, notApplicable: 0 },
    regressions: finished ? 0 : null,
    finishedAt: finished ? '2026-03-01T02:31:00Z' : null,
  });
  const calls = mockFetchRoutes((url) => {
    if (url.endsWith('/matrix')) return { body: { cells: SUITES.map((s, i) => cell(s, finished || i === 0)) } };
    if (url.endsWith('/properties')) return { body: { properties: [] } };
    if (url.endsWith('/workers')) return { body: { workers: [] } };
    if (url.endsWith('/me'))
      return { body: { user: { id: 'u1', email: 'k@x.test', displayName: 'K', role: 'maintainer' } } };
    return { body: { run: run() } };
  });
  return { calls, finish: () => void (finished = true) };
}

describe('RunDetail when its run finishes while the page is open', () => {
  beforeEach(() => jest.useFakeTimers());
  afterEach(() => jest.useRealTimers());

  it('settles to the final matrix without a reload: no cell waits once the header says completed', async () => {
    const server = fakeServer();
    renderWithClient(<RunDetail id={RUNNING_RUN.id} />);
    await waitFor(() => expect(screen.getAllByText(/waiting its turn/).length).toBe(2));
    server.finish();
    await act(() => jest.advanceTimersByTimeAsync(1_600));
    await waitFor(() => expect(screen.getByText(/3 of 3 done/)).toBeTruthy());
    await act(() => jest.advanceTimersByTimeAsync(50));
    expect(screen.queryAllByText(/waiting its turn/)).toHaveLength(0);
    expect(screen.queryByText(/checked nothing/)).toBeNull();
    // Once settled, nothing more is asked for.
    const asked = server.calls.length;
    await act(() => jest.advanceTimersByTimeAsync(30_000));
    expect(server.calls).toHaveLength(asked);
  });

  it('never shows cells waiting under a finished run while the final matrix is on its way', async () => {
    const server = fakeServer();
    // The final answer of the matrix takes 2 s (a large run on a loaded machine); the run's own answer is quick.
    const quick = global.fetch;
    let finished = false;
    global.fetch = jest.fn(async (url: string | URL | Request, init?: RequestInit) => {
      if (finished && String(url).endsWith('/matrix')) await new Promise((done) => setTimeout(done, 2_000));
      return quick(url, init);
    }) as typeof fetch;
    renderWithClient(<RunDetail id={RUNNING_RUN.id} />);
    await waitFor(() => expect(screen.getAllByText(/waiting its turn/).length).toBe(2));
    server.finish();
    finished = true;
    await act(() => jest.advanceTimersByTimeAsync(1_600));
    await waitFor(() => expect(screen.getByText(/3 of 3 done/)).toBeTruthy());
    expect(screen.queryAllByText(/waiting its turn/)).toHaveLength(0);
    expect(screen.queryByText(/checked nothing/)).toBeNull();
    expect(screen.getByTestId('matrix-finishing').textContent).toBe("Fetching this run's final results…");
    await act(() => jest.advanceTimersByTimeAsync(2_100));
    expect(screen.queryByTestId('matrix-finishing')).toBeNull();
    expect(screen.getByTestId('matrix-summary').textContent).toBe(
      '3 checks (3 suites × 1 library version): ✓ 3 passed · ❌ 0 with failures · ◊ 0 stopped by an error',
    );
  });

  it("asks once more for each of the run's other queries when the run is seen to finish", async () => {
    const server = fakeServer();
    renderWithClient(<RunDetail id={RUNNING_RUN.id} />);
    await waitFor(() => expect(screen.getAllByText(/waiting its turn/).length).toBe(2));
    const asked = (path: string) =>
      server.calls.filter((c) => new URL(c.url, 'http://x').pathname.endsWith(path)).length;
    const before = { matrix: asked('/matrix'), properties: asked('/properties') };
    server.finish();
    await act(() => jest.advanceTimersByTimeAsync(1_600));
    await waitFor(() => expect(screen.getByText(/3 of 3 done/)).toBeTruthy());
    await act(() => jest.advanceTimersByTimeAsync(50));
    // The property checks poll every 5 s: without the final fetch they would still be the first answer.
    expect({ matrix: asked('/matrix'), properties: asked('/properties') }).toEqual({
      matrix: before.matrix + 1,
      properties: before.properties + 1,
    });
  });

  it('counts the checks stopped by an error in the header and in what was checked as the matrix does, whatever the point counts and scopes say', async () => {
    const errorCell = (suite: string): RunMatrixCell => ({
      ...cell(suite, true),
      outcome: 'error',
      counts: { pass: 0, fail: 0, error: 0, skipped: 40, notApplicable: 0 },
      // The scope it was to cover stays; none of it was checked.
      skipReasons: [{ reason: `${TARGET} has no acsch`, count: 40, lacks: ['acsch'] }],
    });
    mockFetchRoutes((url) => {
      if (url.endsWith('/matrix'))
        return {
          body: {
            cells: [cell('sqrt-principal-sz', true), errorCell('acsch-principal-sz'), errorCell('acsch-principal-ccw')],
          },
        };
      if (url.endsWith('/properties')) return { body: { properties: [] } };
      if (url.endsWith('/me')) return { body: { user: null } };
      return {
        body: {
          run: {
            ...RUNNING_RUN,
            status: 'completed',
            shardsTotal: 3,
            shardsDone: 3,
            counts: { pass: 40, fail: 0, error: 0, skipped: 80, notApplicable: 0 },
            // As the server counts them when each shard is stored (shard-executor.ts).
            checksStopped: 2,
            checksFailed: 0,
          },
        },
      };
    });
    jest.useRealTimers();
    renderWithClient(<RunDetail id={RUNNING_RUN.id} />);
    // Real timers here, and a loaded machine: give the three answers time to arrive.
    await waitFor(() => expect(screen.getByTestId('run-check-tally')).toBeTruthy(), { timeout: 5_000 });
    expect(screen.getByTestId('run-check-tally').textContent).toBe(
      '✓ 1 passed · ❌ 0 with failures · ◊ 2 stopped by an error',
    );
    expect(screen.getByTestId('matrix-summary').textContent).toContain('◊ 2 stopped by an error');
    // Not "all checked points passed": two checks checked nothing.
    expect(screen.getByLabelText('status: completed with errors')).toBeTruthy();
    expect(screen.getByTestId('run-checks-stopped').textContent).toBe('2 checks stopped by an error');
    // What was checked counts the one check that judged points, and names the two that did not.
    expect(
      screen.getByText(/^• 1 check of a suite against a library version, 2 paths, 40 points in all\.$/),
    ).toBeTruthy();
    expect(screen.getByText(/^• 2 checks of this run checked nothing/)).toBeTruthy();
  });
});
