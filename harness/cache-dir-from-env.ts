import path from 'node:path';

/** The cache folder `SHEETKEEPER_CACHE_DIR` names, resolved, or null when it is unset or blank. */
export function cacheDirFromEnv(env: NodeJS.ProcessEnv = process.env): string | null {
  const chosen = env.SHEETKEEPER_CACHE_DIR?.trim();
  return chosen ? path.resolve(chosen) : null;
}
