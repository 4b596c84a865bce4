import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';

/** A URL of the local cluster (no database name): `fromEnv` when set, else the one from `.data/<fileName>` written by scripts/lib.sh. */
export function readClusterUrl(fromEnv: string | undefined, fileName: string): string {
  if (fromEnv) return fromEnv;
  const file = path.join(__dirname, '..', '..', '.data', fileName);
  if (!existsSync(file))
    throw new Error(
      `No local PostgreSQL (${fileName}): run \`npm test\` (or \`npm start\`) once so scripts/lib.sh creates it.`,
    );
  return readFileSync(file, 'utf8').trim();
}
