import { requiredClusterUrl } from './required-cluster-url';

/** The local cluster's URL without a database, for the application's least-privilege role (scripts/lib.sh). */
export function pgBaseUrl(): string {
  return requiredClusterUrl('app');
}
