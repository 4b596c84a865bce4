import os from 'node:os';
import path from 'node:path';

/**
 * Where npm versions and unpacked tarballs are cached when neither a flag nor the project file
 * says: `SHEETKEEPER_CACHE_DIR`, else `sheetkeeper` under `XDG_CACHE_HOME`, else `~/.cache/sheetkeeper`
 * (the XDG base-directory default). Shared by every project of the user, so a version is installed once.
 */
export function defaultCacheDir(env: NodeJS.ProcessEnv = process.env): string {
  if (env.SHEETKEEPER_CACHE_DIR) return path.resolve(env.SHEETKEEPER_CACHE_DIR);
  if (env.XDG_CACHE_HOME && path.isAbsolute(env.XDG_CACHE_HOME)) return path.join(env.XDG_CACHE_HOME, 'sheetkeeper');
  return path.join(os.homedir(), '.cache', 'sheetkeeper');
}
