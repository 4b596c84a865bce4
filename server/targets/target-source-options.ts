import type { resolveTargetSource } from '../../harness';
import { PROJECT_ROOT, targetCacheDir } from '../config';

/**
 * How this server resolves an admin-added source: relative paths in it (a program's arguments and
 * cwd, a local path) are read from the project folder, whatever folder the process started in, and
 * npm versions go to `cacheDir` (config.targetCacheDir).
 */
export function targetSourceOptions(cacheDir: string = targetCacheDir()): Parameters<typeof resolveTargetSource>[1] {
  return { baseDir: PROJECT_ROOT, cacheDir };
}
