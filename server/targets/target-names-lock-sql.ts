/**
 * Taken by every transaction that decides which target names are taken or frees some (resolving a
 * source, removing one), so two sources finishing at once cannot both claim a name. Per
 * transaction, across processes.
 */
export const TARGET_NAMES_LOCK_SQL = "SELECT pg_advisory_xact_lock(hashtext('target_sources'))";
