import { useQuery } from '@tanstack/react-query';
import { loadSuiteTools } from '../harness/web';

/**
 * The harness's suite check and picture, loaded on demand: they carry mathjs's parser, so the
 * web export keeps them in a chunk of their own that only suite screens fetch.
 */
export function useSuiteTools() {
  return useQuery({
    queryKey: ['suite-tools'],
    queryFn: loadSuiteTools,
    staleTime: Infinity,
    gcTime: Infinity,
  });
}
