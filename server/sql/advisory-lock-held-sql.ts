/**
 * The condition that some session holds the two-key advisory lock (`lockClass`, hashtext(`keySql`))
 * in this database, as pg_advisory_lock(int, int) takes it (objsubid 2). `lockClass` is an integer
 * constant or a parameter; `keySql` an SQL text expression. A lock vanishes the moment its holder's
 * connection closes, which is how a dead worker or shard is told (worker-liveness.ts, shard-liveness.ts).
 */
export function advisoryLockHeldSql(lockClass: number | string, keySql: string): string {
  return `EXISTS (SELECT 1 FROM pg_locks l
                 WHERE l.locktype = 'advisory' AND l.granted AND l.database = (SELECT oid FROM pg_database WHERE datname = current_database())
                   AND l.classid = ${lockClass}::int::oid AND l.objid = hashtext(${keySql})::oid AND l.objsubid = 2)`;
}
