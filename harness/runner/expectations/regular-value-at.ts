import { BigComplex } from '../../reference/complex/big-complex';
import type { Point } from '../../reference/continuation/continuation-path';
import { continueToPoint } from './continue-to-point';
import { nearestSheet } from './nearest-sheet';
import { principalPower } from './principal-power';
import { probePoint } from './probe-point';
import type { RegularBranch } from './regular-branch';
import { REGULAR_TUNING } from './regular-tuning';
import { sheetFactor } from './sheet-factor';
import { pointText } from '../formats/point-text';

const { kindOtherSide, kindRefused, bits } = REGULAR_TUNING;

/**
 * The branch's value at p (kind 0) or continued from the other side of its nearest cut (kind 2),
 * as C·P(p)·e^{2πiνk} rounded once: P exact at p's bits, k the sheet nearest the continued value
 * (`along`, the whole path's continuation there, when there is one). Values and refusals are cached.
 */
export function regularValueAt(branch: RegularBranch, p: Point, kind: number, along: Point | null): Point {
  const { cache, cacheKey, refusals } = branch;
  const out = [0, 0];
  if (cache.get(cacheKey, kind, p[0], p[1], out)) return [out[0] as number, out[1] as number];
  if (cache.get(cacheKey, kindRefused + kind, p[0], p[1], out))
    throw new Error(refusals.get(`${kind}:${p[0]},${p[1]}`) ?? 'the branch has no value here (cached)');
  try {
    if (![p[0], p[1]].every(Number.isFinite)) throw new Error('the branch is checked at finite points only');
    const at = singularAt(branch, p);
    if (at) throw new Error(at);
    const { q, prox } = probePoint(branch, p, kind === kindOtherSide);
    if (kind === kindOtherSide && !prox) throw new Error('not near a cut');
    const F = q === p && along ? along : continueToPoint(branch, q);
    const P = principalPower(branch, BigComplex.fromDoubles(p[0], p[1]));
    const k = nearestSheet(branch, F, [P.re.toDouble(), P.im.toDouble()], pointText(p));
    let f = P.mul(sheetFactor(branch, k)).truncate(bits);
    if (branch.C) f = f.mul(branch.C).truncate(bits);
    const v: Point = [f.re.toDouble(), f.im.toDouble()];
    cache.put(cacheKey, kind, p[0], p[1], v[0], v[1]);
    return v;
  } catch (e) {
    const message = e instanceof Error ? e.message : String(e);
    refusals.set(`${kind}:${p[0]},${p[1]}`, message);
    cache.put(cacheKey, kindRefused + kind, p[0], p[1], NaN, NaN);
    throw new Error(message);
  }
}

/** Why p has no branch value when it is (within 1e-12 relative) a zero or pole of g; null otherwise. */
function singularAt(branch: Pick<RegularBranch, 'singular'>, p: Point): string | null {
  for (const s of branch.singular) {
    if (Math.hypot(p[0] - s.at[0], p[1] - s.at[1]) <= 1e-12 * Math.max(1, Math.hypot(s.at[0], s.at[1]))) {
      return `at a ${s.order > 0 ? 'zero' : 'pole'} of g (${s.at[0]}, ${s.at[1]}), where the branch has no finite non-zero value`;
    }
  }
  return null;
}
