/** A double as text that tells the zeros apart: "+0", "-0", or the number. */
export function zeroText(x: number): string {
  return Object.is(x, -0) ? '-0' : Object.is(x, 0) ? '+0' : String(x);
}
