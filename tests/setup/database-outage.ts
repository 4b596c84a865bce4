import { Client } from 'pg';
import { pgAdminUrl } from './pg-admin-url';

export interface DatabaseOutage {
  /** Terminates every connection to the database (57P01, as a restart does) and refuses new ones. */
  begin(): Promise<void>;
  /** Lets connections in again. Safe to call when no outage is on. */
  end(): Promise<void>;
}

/**
 * An outage of one private test database, never of the shared cluster (the other test files
 * keep using it): `ALTER DATABASE … ALLOW_CONNECTIONS false` and `pg_terminate_backend`, by
 * the administrative role.
 */
export function databaseOutage(databaseUrl: string): DatabaseOutage {
  const name = decodeURIComponent(new URL(databaseUrl).pathname.slice(1));
  const asAdmin = async (sql: string) => {
    const admin = new Client({ connectionString: `${pgAdminUrl()}/postgres` });
    await admin.connect();
    try {
      await admin.query(sql);
    } finally {
      await admin.end();
    }
  };
  return {
    begin: async () => {
      await asAdmin(`ALTER DATABASE "${name}" WITH ALLOW_CONNECTIONS false`);
      await asAdmin(
        `SELECT pg_terminate_backend(pid) FROM pg_stat_activity WHERE datname = '${name}' AND pid <> pg_backend_pid()`,
      );
    },
    end: () => asAdmin(`ALTER DATABASE "${name}" WITH ALLOW_CONNECTIONS true`),
  };
}
