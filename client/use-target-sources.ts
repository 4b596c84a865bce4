import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useEffect, useRef } from 'react';
import type { TargetSourceView } from '../shared/target-source-view';
import { apiFetch } from './api-fetch';
import { TARGETS_KEY } from './use-targets';

export const TARGET_SOURCES_KEY = ['target-sources'] as const;

/** How often the list is read again while a source is resolving: a program's describe takes ~0.1 s, an npm install seconds. */
const RESOLVING_POLL_MS = 2000;

/**
 * The targets admins added, newest first, read again every 2 s while one is still resolving. When
 * one becomes ready the targets list is read again too, so its new target appears there.
 */
export function useTargetSources() {
  const queryClient = useQueryClient();
  const query = useQuery({
    queryKey: TARGET_SOURCES_KEY,
    queryFn: async () => (await apiFetch<{ sources: TargetSourceView[] }>('/target-sources')).sources,
    refetchInterval: (q) => (q.state.data?.some((s) => s.state === 'resolving') ? RESOLVING_POLL_MS : false),
  });
  // Only a source that becomes ready after the first answer adds targets the list has not read;
  // the list alone is read again (exact: the per-target fingerprints and cut maps share its prefix).
  const seenReady = useRef<Set<string> | null>(null);
  const readyIds = (query.data ?? []).filter((s) => s.state === 'ready').map((s) => s.id);
  const readyKey = readyIds.join(' ');
  useEffect(() => {
    if (!query.data) return;
    const ready = new Set(readyKey ? readyKey.split(' ') : []);
    const before = seenReady.current;
    seenReady.current = ready;
    if (before && [...ready].some((id) => !before.has(id)))
      void queryClient.invalidateQueries({ queryKey: TARGETS_KEY, exact: true });
  }, [readyKey, query.data, queryClient]);
  return query;
}
