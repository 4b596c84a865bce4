import type { RangeCondition } from './range-condition';

const HALF_PI = Math.PI / 2;
const re = (min: number, max: number): RangeCondition => ({ part: 're', min, max, ccwOpenMin: false });
const im = (min: number, max: number, ccwOpenMin = false): RangeCondition => ({ part: 'im', min, max, ccwOpenMin });

/**
 * The principal ranges of the catalogue's functions, closed (the signed-zero convention
 * reaches both edges, one from each side of the cut): DLMF §4.2(i) for log, §4.23(ii) for
 * the inverse trigonometric and §4.37(ii) for the inverse hyperbolic functions (the ranges
 * themselves are drawn in the DLMF's figures, not checked here; the reciprocal cousins share the range of the function they invert through
 * 1/z). `ccwOpenMin` is set where DLMF writes the range half-open (−π < Im log z ≤ π), which
 * is Kahan's counter-clockwise choice. Powers and roots have their own rule (powerRange).
 */
export const PRINCIPAL_RANGE: Readonly<Record<string, readonly RangeCondition[]>> = {
  sqrt: [{ part: 'arg', min: -HALF_PI, max: HALF_PI, ccwOpenMin: true }],
  log: [im(-Math.PI, Math.PI, true)],
  asin: [re(-HALF_PI, HALF_PI)],
  acos: [re(0, Math.PI)],
  atan: [re(-HALF_PI, HALF_PI)],
  asinh: [im(-HALF_PI, HALF_PI)],
  acosh: [re(0, Infinity), im(-Math.PI, Math.PI, true)],
  atanh: [im(-HALF_PI, HALF_PI)],
  acsc: [re(-HALF_PI, HALF_PI)],
  asec: [re(0, Math.PI)],
  acot: [re(-HALF_PI, HALF_PI)],
  acsch: [im(-HALF_PI, HALF_PI)],
  asech: [re(0, Infinity), im(-Math.PI, Math.PI)],
  acoth: [im(-HALF_PI, HALF_PI)],
};
