import { copyFileSync, existsSync, mkdtempSync, readdirSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';

/**
 * A reference cache folder of the calling test's own (a new temporary folder: the caller removes
 * it), filled with the `.bin` files of SHEETKEEPER_TEST_REFERENCE_SEED when that names a folder.
 *
 * `npm test` names the cache that its own e2e seed wrote a minute earlier, from the same code
 * (scripts/test.sh): the demo catalogue's reference values are then computed once per `npm test`
 * instead of once more in each node test file that runs demo suites end to end (seeding the demo
 * runs cost 35 s without them and 12 s with them, measured on a loaded 2-core machine). Without
 * the variable (a single file run by hand) the folder starts empty and every value is computed,
 * as before. The reference engine's own tests never use this: they compute from scratch.
 */
export function seededReferenceCacheDir(): string {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'sheetkeeper-reference-cache-'));
  const seed = process.env.SHEETKEEPER_TEST_REFERENCE_SEED;
  if (seed && existsSync(seed)) {
    for (const name of readdirSync(seed)) {
      if (name.endsWith('.bin')) copyFileSync(path.join(seed, name), path.join(dir, name));
    }
  }
  return dir;
}
