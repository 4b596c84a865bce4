/**
 * A wire number (docs/suite-format.md) as the double it names: "-0", "inf", "-inf", "nan", or a
 * shortest round-trip decimal, which reads back as exactly the double that was written.
 */
export function parseWireNumber(s: string): number {
  if (s === 'inf' || s === '+inf') return Infinity;
  if (s === '-inf') return -Infinity;
  if (s === 'nan') return NaN;
  if (s === '-0') return -0;
  return Number(s);
}
