/**
 * One line for a log about an error, without the values that travel with it. A TypeORM
 * `QueryFailedError` carries the query's parameters (token hashes, password hashes, request
 * bodies) and PostgreSQL's `detail` repeats key values ("Key (token_hash)=(…) already exists"):
 * both are left out. The message, SQLSTATE, constraint, table and column names stay, which is
 * what is needed to find the cause; the first stack frames point at the code.
 */
export function describeError(err: unknown): string {
  if (typeof err === 'string') return withoutTrailingValue(err);
  if (!(err instanceof Error)) return `non-error thrown: ${typeof err}`;
  const e = err as Error & {
    code?: unknown;
    constraint?: unknown;
    table?: unknown;
    column?: unknown;
    query?: unknown;
    parameters?: unknown;
    driverError?: unknown;
  };
  const driver = (e.driverError ?? e) as typeof e;
  const parts = [`${err.name}: ${withoutTrailingValue(err.message)}`];
  for (const key of ['code', 'constraint', 'table', 'column'] as const) {
    const value = driver[key] ?? e[key];
    if (typeof value === 'string' && value) parts.push(`${key} ${value}`);
  }
  if (typeof e.query === 'string') parts.push(`query: ${oneLine(e.query)}`);
  if (Array.isArray(e.parameters)) parts.push(`${e.parameters.length} parameter(s), values not logged`);
  const frames = (err.stack ?? '')
    .split('\n')
    .filter((line) => line.trimStart().startsWith('at '))
    .slice(0, 3);
  return [parts.join(' | '), ...frames].join('\n');
}

/** The SQL text only (never values): TypeORM puts values in `parameters`, not in the text. */
function oneLine(sql: string): string {
  const flat = sql.replace(/\s+/g, ' ').trim();
  return flat.length > 300 ? `${flat.slice(0, 300)}…` : flat;
}

/**
 * PostgreSQL ends a message about a bad value with the value itself ('invalid input syntax for
 * type uuid: "…"'); identifiers in its other messages are not after a colon.
 */
function withoutTrailingValue(message: string): string {
  return message.replace(/: ".*"$/s, ': "…"');
}
