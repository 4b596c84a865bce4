import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { act, renderHook, waitFor } from '@testing-library/react';
import type { ReactNode } from 'react';
import { isLiveRun } from '../../client/is-live-run';
import { useRun } from '../../client/use-run';
import { useRunMatrix } from '../../client/use-run-matrix';
import { useRunProperties } from '../../client/use-run-properties';
import type { RunMatrixCell } from '../../shared/run-matrix-cell';
import type { RunView } from '../../shared/run-view';
import { mockFetchRoutes } from '../setup/mock-fetch-routes';
import { RUNNING_RUN } from '../setup/running-run';

/** A running run with two shards, neither done. */
const RUN: RunView = {
  ...RUNNING_RUN,
  shardsTotal: 2,
  shardsDone: 0,
  counts: { pass: 0, fail: 0, error: 0, skipped: 0, notApplicable: 0 },
};

const cell = (suite: string, done: boolean): RunMatrixCell => ({
  suite,
  target: 'complex.js@2.4.3',
  status: done ? 'done' : 'running',
  outcome: done ? 'fail' : null,
  counts: done ? { pass: 10, fail: 2, error: 0, skipped: 0, notApplicable: 0 } : null,
  byClass: done ? { branch: 2, accuracy: 0 } : null,
  byDiagnosis: done ? { 'zero-sign': 2 } : null,
  checked: null,
  errors: [],
  skipReasons: [],
  worker: done ? 'build-7:4121' : null,
  noWorkerHasTarget: false,
  lawsFailed: 0,
  loopsFailed: [],
});

function wrapper({ children }: { children: ReactNode }) {
  // The app's 30 s staleTime (client/create-query-client.ts): a cached answer from earlier in the
  // run must not stand in for the finished run's.
  const client = new QueryClient({
    defaultOptions: { queries: { retry: false, gcTime: Infinity, staleTime: 30_000 } },
  });
  return <QueryClientProvider client={client}>{children}</QueryClientProvider>;
}

/** The run page's three queries together: the matrix and the property checks follow the run's liveness. */
function useRunPage(id: string) {
  const run = useRun(id);
  const live = run.data ? isLiveRun(run.data) : undefined;
  return { run, matrix: useRunMatrix(id, live), properties: useRunProperties(id, live) };
}

describe('a run page whose run ends between two polls of its matrix', () => {
  beforeEach(() => jest.useFakeTimers());
  afterEach(() => jest.useRealTimers());

  it('asks for the matrix and the property checks once more when the run ends, and shows the finished cells', async () => {
    // The server's state: both shards finish between the page's first and second look at the run.
    let finished = false;
    const calls = mockFetchRoutes((url) => {
      if (url.endsWith('/matrix')) return { body: { cells: [cell('sqrt', finished), cell('log', finished)] } };
      if (url.endsWith('/properties')) return { body: { properties: [] } };
      const status = finished ? 'completed' : 'running';
      return { body: { run: { ...RUN, status, shardsDone: finished ? 2 : 0 } } };
    });
    const { result } = renderHook(() => useRunPage(RUN.id), { wrapper });
    await waitFor(() => expect(result.current.matrix.data?.[0]?.status).toBe('running'));
    finished = true;
    // The run is polled every 1.5 s, the matrix every 2.5 s: the run is seen completed first.
    await act(() => jest.advanceTimersByTimeAsync(1_600));
    expect(result.current.run.data?.status).toBe('completed');
    await act(() => jest.advanceTimersByTimeAsync(100));
    expect(result.current.matrix.data?.map((c) => c.outcome)).toEqual(['fail', 'fail']);
    expect(calls.filter((c) => c.url.endsWith('/properties'))).toHaveLength(2);
    // Then nothing more: the run has settled.
    const asked = calls.length;
    await act(() => jest.advanceTimersByTimeAsync(30_000));
    expect(calls).toHaveLength(asked);
  });
});
