import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';

const DATA_DIR = path.resolve(__dirname, '..', '..', '.data');

/**
 * The local cluster's URL without a database name, for one of the two roles scripts/lib.sh makes:
 * `app` (least privilege; the server, worker, seed and migrations) or `admin` (creates and drops
 * databases; the scripts and the test set-up only). SHEETKEEPER_PG_URL or SHEETKEEPER_PG_ADMIN_URL
 * when set, else `.data/pg-url` or `.data/pg-admin-url`; null when neither exists.
 */
export function clusterUrl(role: 'app' | 'admin'): string | null {
  const fromEnv = role === 'admin' ? process.env.SHEETKEEPER_PG_ADMIN_URL : process.env.SHEETKEEPER_PG_URL;
  if (fromEnv) return fromEnv;
  const file = path.join(DATA_DIR, role === 'admin' ? 'pg-admin-url' : 'pg-url');
  return existsSync(file) ? readFileSync(file, 'utf8').trim() : null;
}
