/** Parts of a version compared; "1.2.3-4.5" has five. Parts beyond this do not order versions. */
const PARTS = 6;

/**
 * A version as SQL that orders the way the harness's `compareVersions` does
 * (harness/adapters/compare-versions.ts): split at "." and "-", each part a number (a part that
 * is not digits counts 0), missing parts 0, so "2.10.0" > "2.9.1" and "2.5" = "2.5.0". Compared as
 * bigint arrays of a fixed length, which PostgreSQL orders part by part.
 * `tests/server/sql/version-order-sql.test.ts` holds the two orders equal.
 */
export function versionOrderSql(column: string): string {
  const parts = Array.from({ length: PARTS }, (_, i) => {
    const part = `split_part(replace(${column}, '-', '.'), '.', ${i + 1})`;
    return `CASE WHEN ${part} ~ '^[0-9]{1,18}$' THEN ${part}::bigint ELSE 0 END`;
  });
  return `ARRAY[${parts.join(', ')}]`;
}
