const DECIMAL = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/**
 * Reads a number of path geometry. A decimal string becomes the nearest double
 * (ties to even): ECMAScript's StringToNumber is correctly rounded for decimal
 * literals of any length (ECMA-262 §7.1.4.1.1, round-to-nearest of the exact
 * mathematical value), so Number() is exact conversion here. "-0" stays −0.
 * Hex, "Infinity", empty strings and other text that Number() would accept or turn
 * into 0 are refused, as are non-finite doubles: geometry is finite.
 */
export function geometryNumber(x: number | string, what = 'number'): number {
  if (typeof x === 'string') {
    const text = x.trim();
    if (!DECIMAL.test(text)) throw new RangeError(`${what}: "${x}" is not a decimal number`);
    x = Number(text);
  }
  if (!Number.isFinite(x)) throw new RangeError(`${what}: ${x} is not finite`);
  return x;
}
