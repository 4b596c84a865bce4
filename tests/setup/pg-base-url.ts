import { readClusterUrl } from './read-cluster-url';

/** The local cluster's URL without a database, for the application's least-privilege role, as written by scripts/lib.sh. */
export function pgBaseUrl(): string {
  return readClusterUrl(process.env.SHEETKEEPER_PG_URL, 'pg-url');
}
