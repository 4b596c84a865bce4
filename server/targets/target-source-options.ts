import type { resolveTargetSource } from '../../harness';
import { DEFAULT_TARGET_CACHE_DIR, PROJECT_ROOT } from '../config';

/**
 * How this server resolves an admin-added source: relative paths in it (a program's arguments and
 * cwd, a local path) are read from the project folder, whatever folder the process started in, and
 * npm versions go to `cacheDir` (config.targetCacheDir).
 */
export function targetSourceOptions(
  cacheDir: string = DEFAULT_TARGET_CACHE_DIR,
): Parameters<typeof resolveTargetSource>[1] {
  return { baseDir: PROJECT_ROOT, cacheDir };
}
