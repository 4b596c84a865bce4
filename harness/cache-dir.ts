import os from 'node:os';
import path from 'node:path';
import { cacheDirFromEnv } from './cache-dir-from-env';

/**
 * The user's cache folder for what the harness builds or fetches on first use (the compiled C
 * adapter, under c-adapter/): `SHEETKEEPER_CACHE_DIR` when set, else ~/.cache/sheetkeeper. Read on
 * every call, so a test or a worker can point it elsewhere through the environment.
 */
export function cacheDir(env: NodeJS.ProcessEnv = process.env): string {
  return cacheDirFromEnv(env) ?? path.join(os.homedir(), '.cache', 'sheetkeeper');
}
