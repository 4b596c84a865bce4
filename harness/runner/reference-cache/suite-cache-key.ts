import { createHash } from 'node:crypto';
import type { Suite } from '../../../shared/schemas/suite-schema';

/**
 * Bump when the reference engine or the expectation rules change what a value is, so cached
 * values from before are not reused.
 */
export const REFERENCE_CACHE_GENERATION = 1;

/**
 * The reference cache's key for a suite: its id and version (as results name them) and a hash
 * of what fixes the values — subject, branch, convention and the cache generation. Paths are
 * not in it: the cache is keyed by each point's exact bits, so a new path reuses shared points.
 */
export function suiteCacheKey(suite: Suite): string {
  const hash = createHash('sha256')
    .update(
      JSON.stringify({
        subject: suite.subject,
        branch: suite.branch,
        convention: suite.convention,
        generation: REFERENCE_CACHE_GENERATION,
      }),
    )
    .digest('hex')
    .slice(0, 12);
  return `${suite.id}@${suite.version}-${hash}`;
}
