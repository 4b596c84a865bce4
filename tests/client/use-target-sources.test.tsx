import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { act, renderHook, waitFor } from '@testing-library/react';
import type { ReactNode } from 'react';
import { useTargetSources } from '../../client/use-target-sources';
import { useTargets } from '../../client/use-targets';
import { mockFetchRoutes } from '../setup/mock-fetch-routes';

const source = (id: string, state: 'ready' | 'resolving') => ({ id, state, targets: [] });

function wrapper({ children }: { children: ReactNode }) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false, gcTime: Infinity } } });
  return <QueryClientProvider client={client}>{children}</QueryClientProvider>;
}

describe('useTargetSources', () => {
  beforeEach(() => jest.useFakeTimers());
  afterEach(() => jest.useRealTimers());

  it('reads the targets list again only when a source becomes ready, not because one already was', async () => {
    let sources = [source('a', 'ready'), source('b', 'resolving')];
    const calls = mockFetchRoutes((url) => ({ body: url.endsWith('/target-sources') ? { sources } : { targets: [] } }));
    const targetReads = () => calls.filter((c) => c.url.endsWith('/api/targets')).length;
    const { result } = renderHook(() => ({ sources: useTargetSources(), targets: useTargets() }), { wrapper });
    await waitFor(() => expect(result.current.sources.data).toHaveLength(2));
    await waitFor(() => expect(result.current.targets.data).toBeDefined());
    expect(targetReads()).toBe(1);

    sources = [source('a', 'ready'), source('b', 'ready')];
    await act(() => jest.advanceTimersByTimeAsync(2_100));
    await waitFor(() => expect(targetReads()).toBe(2));
    await act(() => jest.advanceTimersByTimeAsync(10_000));
    expect(targetReads()).toBe(2);
  });
});
