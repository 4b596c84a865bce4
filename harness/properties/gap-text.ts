import type { ComplexPair } from '../adapters/complex-pair';
import { relativeError } from '../checks/relative-error';

/**
 * How far a law's left side is from its right, against what the law allows, for a failure's
 * reason: "by 3.1e-14 of |g(z)| (allowed 7.1e-15)", or "(one side is not finite)".
 */
export function gapText(left: ComplexPair, right: ComplexPair, rightName: string, allowed: number): string {
  const gap = relativeError(left, right);
  return Number.isFinite(gap)
    ? `by ${gap.toPrecision(3)} of |${rightName}| (allowed ${allowed.toPrecision(3)})`
    : '(one side is not finite)';
}
