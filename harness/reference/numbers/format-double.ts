/**
 * The wire form of a double: the shortest decimal that reads back to it (ECMAScript's
 * Number::toString guarantees round-trip), with "-0", "inf", "-inf" and "nan".
 */
export function formatDouble(x: number): string {
  if (x !== x) return 'nan';
  if (x === Infinity) return 'inf';
  if (x === -Infinity) return '-inf';
  if (x === 0) return Object.is(x, -0) ? '-0' : '0';
  return String(x);
}
