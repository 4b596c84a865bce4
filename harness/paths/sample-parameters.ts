import { geometryNumber } from './geometry-number';

/**
 * The parameter values of a path: i/(samples − 1) for i = 0 … samples − 1 (the
 * division is correctly rounded, and 0 and 1 are exact), or the explicit list.
 */
export function sampleParameters(sampling: { samples?: number; at?: (number | string)[] }): number[] {
  if (sampling.at !== undefined) {
    if (sampling.samples !== undefined) throw new RangeError('give either samples or at, not both');
    return sampling.at.map((x, i) => {
      const t = geometryNumber(x, `at[${i}]`);
      if (t < 0 || t > 1) throw new RangeError(`at[${i}] = ${t} is outside [0, 1]`);
      return t === 0 ? 0 : t;
    });
  }
  const n = sampling.samples;
  if (n === undefined || !Number.isInteger(n) || n < 1) throw new RangeError('samples must be a positive integer');
  if (n === 1) return [0];
  return Array.from({ length: n }, (_, i) => i / (n - 1));
}
