const view = new DataView(new ArrayBuffer(8));

/**
 * A double as a C99 hex float, exactly: "0x1.8p+1", "-0x1p-1", "0x0.0000000000001p-1022"
 * (subnormal), "0x0p+0" and "-0x0p+0"; "inf", "-inf", "nan" as Python's float.fromhex and
 * C's strtod read them.
 */
export function formatHexDouble(x: number): string {
  if (Number.isNaN(x)) return 'nan';
  if (x === Infinity) return 'inf';
  if (x === -Infinity) return '-inf';
  view.setFloat64(0, x);
  const bits = view.getBigUint64(0);
  const sign = bits >> 63n ? '-' : '';
  const exponent = Number((bits >> 52n) & 0x7ffn);
  const mantissa = bits & 0xfffffffffffffn;
  if (exponent === 0 && mantissa === 0n) return `${sign}0x0p+0`;
  const digits = mantissa.toString(16).padStart(13, '0').replace(/0+$/, '');
  const fraction = digits ? `.${digits}` : '';
  if (exponent === 0) return `${sign}0x0${fraction}p-1022`;
  const e = exponent - 1023;
  return `${sign}0x1${fraction}p${e >= 0 ? '+' : ''}${e}`;
}
