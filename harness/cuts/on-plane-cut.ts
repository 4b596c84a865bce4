import type { ComplexPair } from '../adapters/complex-pair';
import type { PlaneCut } from './plane-cut';

/**
 * Whether z lies exactly on a cut that runs along the real or the imaginary axis (a zero in
 * the across part, either sign), strictly between its ends, or with `closed` also at its finite
 * ends. Oblique cuts return false: a double is on them only by accident of rounding.
 */
export function onPlaneCut(cut: PlaneCut, [re, im]: ComplexPair, closed = false): boolean {
  const [fx, fy] = cut.from;
  const [tx, ty] = cut.to;
  const between = (x: number, a: number, b: number): boolean => {
    if (closed && (x === a || (!cut.toInfinity && x === b))) return true;
    return cut.toInfinity ? (b > a ? x > a : x < a) : x > Math.min(a, b) && x < Math.max(a, b);
  };
  if (fy === 0 && ty === 0) return im === 0 && between(re, fx, tx);
  if (fx === 0 && tx === 0) return re === 0 && between(im, fy, ty);
  return false;
}
