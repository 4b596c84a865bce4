import { parseDouble } from '../reference/numbers/parse-double';

const DECIMAL = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
const HEX_OR_RATIO = /^[+-]?(0[xX]([0-9a-fA-F]+\.?[0-9a-fA-F]*|\.[0-9a-fA-F]+)([pP][+-]?\d+)?|\d+\/\d+)$/;

/**
 * Reads a number of path geometry. A decimal string becomes the nearest double
 * (ties to even): ECMAScript's StringToNumber is correctly rounded for decimal
 * literals of any length (ECMA-262 §7.1.4.1.1, round-to-nearest of the exact
 * mathematical value), so Number() is exact conversion here. "-0" stays −0.
 * The other forms of the wire format (docs/suite-format.md), a C hex float or a ratio "p/q",
 * go through the reference engine's parseDouble, which rounds them exactly too.
 * "Infinity", empty strings and other text that Number() would accept or turn into 0
 * are refused, as are non-finite values: geometry is finite.
 */
export function geometryNumber(x: number | string, what = 'number'): number {
  if (typeof x === 'string') {
    const text = x.trim();
    if (DECIMAL.test(text)) x = Number(text);
    else if (HEX_OR_RATIO.test(text)) x = parseDouble(text);
    else throw new RangeError(`${what}: "${x}" is not a decimal, hex float or ratio`);
  }
  if (!Number.isFinite(x)) throw new RangeError(`${what}: ${x} is not finite`);
  return x;
}
