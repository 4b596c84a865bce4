import { rmSync } from 'node:fs';
import { ReferenceCache } from '../../harness/runner/reference-cache/reference-cache';
import { seededReferenceCacheDir } from './seeded-reference-cache-dir';

/**
 * A reference cache over a folder of the calling test file's own, started from `npm test`'s
 * seeded values (seeded-reference-cache-dir.ts) and removed after the file. For the runner's
 * tests, which test how suites are run and judged, not how the reference values are computed:
 * the reference engine's own tests compute from scratch.
 */
export function seededReferenceCache(): ReferenceCache & { dir: string } {
  const dir = seededReferenceCacheDir();
  afterAll(() => rmSync(dir, { recursive: true, force: true }));
  return new ReferenceCache(dir) as ReferenceCache & { dir: string };
}
