/**
 * A coordinate for a picture's words and labels, with `digits` significant digits (trailing
 * zeros dropped), exponent form past 1e4 and below 1e-3, and U+2212 for minus: "−0.5", "1e−310".
 */
export function formatPlaneNumber(v: number, digits = 3): string {
  if (!Number.isFinite(v)) return String(v);
  if (v === 0) return '0';
  const a = Math.abs(v);
  const text =
    a >= 1e4 || a < 1e-3
      ? v
          .toExponential(Math.max(0, digits - 1))
          .replace(/\.?0+e/, 'e')
          .replace('e+', 'e')
      : String(Number(v.toPrecision(digits)));
  return text.replace(/-/g, '\u2212');
}
