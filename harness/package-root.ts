import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';

/**
 * The folder of the package this code runs from: the repository's root when run from source
 * (harness/*.ts through tsx), and the packed CLI's own folder when run compiled from an install
 * (its JavaScript sits one level deeper, under dist/). Found by walking up from this file to the
 * first package.json whose `sheetkeeperRoot` field is true, so the answer does not depend on how
 * deep the compiled tree is. Files shipped with the harness (suites/, adapters' programs, the
 * demo reference values) are found from here, never from `__dirname` counting.
 */
function findPackageRoot(start: string): string {
  for (let dir = start; ; dir = path.dirname(dir)) {
    const manifest = path.join(dir, 'package.json');
    if (existsSync(manifest)) {
      try {
        if ((JSON.parse(readFileSync(manifest, 'utf8')) as { sheetkeeperRoot?: unknown }).sheetkeeperRoot === true)
          return dir;
      } catch {
        // An unreadable package.json is not ours; keep walking.
      }
    }
    if (path.dirname(dir) === dir) throw new Error(`no package.json with "sheetkeeperRoot": true above ${start}`);
  }
}

export const PACKAGE_ROOT = findPackageRoot(__dirname);
