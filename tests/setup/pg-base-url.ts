import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';

/** The local cluster's URL without a database, as written by scripts/lib.sh. */
export function pgBaseUrl(): string {
  if (process.env.SHEETKEEPER_PG_URL) return process.env.SHEETKEEPER_PG_URL;
  const file = path.join(__dirname, '..', '..', '.data', 'pg-url');
  if (!existsSync(file))
    throw new Error('No local PostgreSQL: run `npm test` (or `npm start`) once so scripts/lib.sh creates it.');
  return readFileSync(file, 'utf8').trim();
}
