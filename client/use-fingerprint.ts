import { useQuery } from '@tanstack/react-query';
import type { ComputedAnswer } from '../shared/computed-answer';
import type { ConventionFingerprint } from '../shared/convention-fingerprint';
import { apiFetch } from './api-fetch';
import { TARGETS_KEY } from './use-targets';
import { targetPath } from './target-path';

/**
 * The convention fingerprint of one installed target, with values built through `entry` (absent:
 * the target's default). It depends only on the installed version (part of the name) and the
 * entry, so it never goes stale while the page is open.
 */
export function useFingerprint(name: string, entry?: string) {
  return useQuery({
    queryKey: [...TARGETS_KEY, name, 'fingerprint', entry ?? '(default)'],
    queryFn: () =>
      apiFetch<{ fingerprint: ConventionFingerprint } & ComputedAnswer>(
        `${targetPath(name, 'fingerprint')}${entry ? `?entry=${encodeURIComponent(entry)}` : ''}`,
      ),
    staleTime: Infinity,
    enabled: name.length > 0,
  });
}
