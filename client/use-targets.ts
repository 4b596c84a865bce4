import { useQuery } from '@tanstack/react-query';
import type { TargetView } from '../shared/target-view';
import { apiFetch } from './api-fetch';

export const TARGETS_KEY = ['targets'] as const;

/** The targets the server has seen, installed ones first, with their versions and settings. */
export function useTargets() {
  return useQuery({
    queryKey: TARGETS_KEY,
    queryFn: async () => (await apiFetch<{ targets: TargetView[] }>('/targets')).targets,
  });
}
