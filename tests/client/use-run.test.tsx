import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { act, renderHook, waitFor } from '@testing-library/react';
import type { ReactNode } from 'react';
import { useOverview } from '../../client/use-overview';
import { findingsByKindKey } from '../../client/findings-by-kind-key';
import { useRun } from '../../client/use-run';
import { mockFetchRoutes } from '../setup/mock-fetch-routes';
import { RUNNING_RUN } from '../setup/running-run';

const RUN = RUNNING_RUN;

function wrapper({ children }: { children: ReactNode }) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false, gcTime: Infinity } } });
  return <QueryClientProvider client={client}>{children}</QueryClientProvider>;
}

/** Answers with the run as the worker moves it on: one shard more per request, completed at the last. */
function movingRun() {
  let done = 0;
  return mockFetchRoutes(() => {
    done = Math.min(done + 1, RUN.shardsTotal);
    const status = done === RUN.shardsTotal ? 'completed' : 'running';
    return {
      body: {
        run: { ...RUN, shardsDone: done, status },
        overview: { plans: [], inProgress: status === 'running' ? [{ ...RUN, shardsDone: done }] : [], needsMe: {} },
      },
    };
  });
}

describe('live queries', () => {
  beforeEach(() => jest.useFakeTimers());
  afterEach(() => jest.useRealTimers());

  it('asks for a running run again until it completes, then stops', async () => {
    const calls = movingRun();
    const { result } = renderHook(() => useRun(RUN.id), { wrapper });
    await waitFor(() => expect(result.current.data?.shardsDone).toBe(1));
    for (const expected of [2, 3, 4]) {
      await act(() => jest.advanceTimersByTimeAsync(1_600));
      expect(result.current.data?.shardsDone).toBe(expected);
    }
    expect(result.current.data?.status).toBe('completed');
    const asked = calls.length;
    await act(() => jest.advanceTimersByTimeAsync(30_000));
    expect(calls).toHaveLength(asked);
  });

  it("marks the plan's findings picture stale when the run is seen to finish, and not before", async () => {
    movingRun();
    const client = new QueryClient({ defaultOptions: { queries: { retry: false, gcTime: Infinity } } });
    const own = ({ children }: { children: ReactNode }) => (
      <QueryClientProvider client={client}>{children}</QueryClientProvider>
    );
    const picture = [...findingsByKindKey(RUN.planId!), 8];
    const other = [...findingsByKindKey('another-plan'), 8];
    client.setQueryData(picture, { runs: [] });
    client.setQueryData(other, { runs: [] });
    const stale = (key: readonly unknown[]) => client.getQueryState(key)?.isInvalidated;
    const { result } = renderHook(() => useRun(RUN.id), { wrapper: own });
    await waitFor(() => expect(result.current.data?.shardsDone).toBe(1));
    await act(() => jest.advanceTimersByTimeAsync(1_600));
    expect(stale(picture)).toBe(false);
    await act(() => jest.advanceTimersByTimeAsync(1_600));
    await act(() => jest.advanceTimersByTimeAsync(1_600));
    expect(result.current.data?.status).toBe('completed');
    expect(stale(picture)).toBe(true);
    expect(stale(other)).toBe(false);
  });

  it('keeps the Overview fresh while a run is in progress, and only then', async () => {
    const calls = movingRun();
    const { result } = renderHook(() => useOverview(), { wrapper });
    await waitFor(() => expect(result.current.data?.inProgress).toHaveLength(1));
    await act(() => jest.advanceTimersByTimeAsync(2_100));
    await act(() => jest.advanceTimersByTimeAsync(2_100));
    await act(() => jest.advanceTimersByTimeAsync(2_100));
    expect(result.current.data?.inProgress).toHaveLength(0);
    const asked = calls.length;
    expect(asked).toBe(4);
    await act(() => jest.advanceTimersByTimeAsync(30_000));
    expect(calls).toHaveLength(asked);
  });
});
