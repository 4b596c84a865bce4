/**
 * A target without its version, in SQL: "complex.js@2.4.1" → "complex.js",
 * "mathjs@15.2.0/number" → "mathjs/number". Runs and verdicts apply per key, so an upgrade of
 * a library is compared with the version before it and keeps the verdicts given on it.
 */
export function targetKeySql(column: string): string {
  return `regexp_replace(${column}, '@[^/]+', '')`;
}
