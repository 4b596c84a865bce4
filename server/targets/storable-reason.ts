/** Longest failure reason stored; describe errors quote a program's stderr, which can be long. */
const MAX_REASON = 2000;

/**
 * A resolver's error message made fit for a `text` column and the screen: NUL and unpaired
 * surrogates (a program's stderr may hold either; PostgreSQL refuses NUL) become U+FFFD, and the
 * text is cut at MAX_REASON characters with an ellipsis.
 */
export function storableReason(message: string): string {
  const clean = message.replace(
    /\u0000|[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/g,
    '\ufffd',
  );
  return clean.length > MAX_REASON ? `${clean.slice(0, MAX_REASON - 1)}…` : clean;
}
