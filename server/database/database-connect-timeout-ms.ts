/**
 * How long a pool waits for a new PostgreSQL connection before the request fails with 503.
 * A refused or closed port fails at once; this bounds an unanswering one (no timeout is
 * node-postgres's default, and a request would hang). A new loopback connection with SCRAM
 * took 11 ms (median) and 42 ms (slowest) of 20 on the shared 2-core machine, so 5 s never cuts a
 * slow but live server short.
 */
export const DATABASE_CONNECT_TIMEOUT_MS = 5000;
