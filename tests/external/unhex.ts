/** Reads Python's float.hex output (or inf/nan) back into a double. */
export function unhex(text: string): number {
  const t = text.trim();
  if (t === 'nan' || t === '-nan') return NaN;
  if (t === 'inf') return Infinity;
  if (t === '-inf') return -Infinity;
  const m = /^(-?)0x([01])\.([0-9a-f]+)p([+-]\d+)$/.exec(t);
  if (!m) throw new Error(`not a float.hex: ${t}`);
  const [, sign, lead, frac, exp] = m as unknown as [string, string, string, string, string];
  const mantissa = Number(BigInt('0x' + lead + frac)) / 2 ** (4 * frac.length);
  const v = mantissa * 2 ** Number(exp);
  return sign === '-' ? -v : v;
}
