import { requiredClusterUrl } from './required-cluster-url';

/**
 * The local cluster's administrative role (no database), as written by scripts/lib.sh: it
 * creates and drops the test databases. The app under test connects with pgBaseUrl() instead.
 */
export function pgAdminUrl(): string {
  return requiredClusterUrl('admin');
}
