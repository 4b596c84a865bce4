/** 10^k as a ring label: "1", "10", "100", "1000", then "1e4", "1e−300" (U+2212), never "0" for 1e−324. */
export function decadeText(k: number): string {
  if (k >= 0 && k <= 3) return String(10 ** k);
  return `1e${String(k).replace('-', '\u2212')}`;
}
