import { useQueries } from '@tanstack/react-query';
import type { ComputedAnswer } from '../shared/computed-answer';
import type { VersionMatrix } from '../shared/version-matrix';
import { apiFetch } from './api-fetch';
import { TARGETS_KEY } from './use-targets';
import { targetPath } from './target-path';

/**
 * Suites per request: the server takes at most eight, and four (about half a second for
 * complex.js's seven versions) let the first rows appear soon and the rest follow.
 */
const GROUP = 4;

/**
 * The version matrix of one library over the given suites (their newest approved versions),
 * asked for in groups so the server never runs long on one request. Returns every group's
 * query, the suites in the order given as far as they have arrived, and the versions compared.
 * `entry` compares every suite with its inputs built through that entry (absent: each suite's own).
 */
export function useVersionMatrix(library: string, slugs: string[], entry?: string) {
  const groups: string[][] = [];
  for (let i = 0; i < slugs.length; i += GROUP) groups.push(slugs.slice(i, i + GROUP));
  const queries = useQueries({
    queries: groups.map((group) => ({
      queryKey: [...TARGETS_KEY, library, 'version-matrix', group, entry ?? '(each suite’s own)'],
      queryFn: () =>
        apiFetch<{ matrix: VersionMatrix } & ComputedAnswer>(
          `${targetPath(library, 'version-matrix')}?${new URLSearchParams({ suite: group.join(','), ...(entry ? { entry } : {}) }).toString()}`,
        ),
      staleTime: Infinity,
    })),
  });
  const arrived = queries.flatMap((q) => (q.data ? [q.data.matrix] : []));
  return {
    queries,
    versions: arrived[0]?.versions ?? [],
    suites: arrived.flatMap((m) => m.suites),
    groups: groups.length,
    done: queries.filter((q) => q.isSuccess).length,
    /** Suites whose group is still being compared. */
    pendingSuites: queries.reduce((n, q, i) => n + (q.isPending ? groups[i]!.length : 0), 0),
    failed: queries.filter((q) => q.isError),
  };
}
