import { useQuery } from '@tanstack/react-query';
import type { SuiteTools } from '../harness/suites/suite-tools';

/**
 * The harness's suite check and picture, loaded on demand: they carry mathjs's parser, so the
 * web export keeps them in a chunk of their own that only suite screens fetch.
 */
export function useSuiteTools() {
  return useQuery({
    queryKey: ['suite-tools'],
    queryFn: async (): Promise<SuiteTools> => (await import('../harness/suites/suite-tools')).suiteTools,
    staleTime: Infinity,
    gcTime: Infinity,
  });
}
