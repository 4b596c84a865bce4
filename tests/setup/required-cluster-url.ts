import { clusterUrl } from '../../server/database/cluster-url';

/** clusterUrl(role), or an error that says how to create the local cluster. */
export function requiredClusterUrl(role: 'app' | 'admin'): string {
  const url = clusterUrl(role);
  if (!url) throw new Error('No local PostgreSQL: run `npm test` (or `npm start`) once so scripts/lib.sh creates it.');
  return url;
}
