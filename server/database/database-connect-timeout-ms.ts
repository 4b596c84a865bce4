/**
 * How long a pool waits for a new PostgreSQL connection before the request fails with 503.
 * A refused or closed port fails at once; this bounds an unanswering one (no timeout is
 * node-postgres's default, and a request would hang). A healthy loopback connection with
 * SCRAM takes ~5–10 ms here, so 5 s never cuts a slow but live server short.
 */
export const DATABASE_CONNECT_TIMEOUT_MS = 5000;
