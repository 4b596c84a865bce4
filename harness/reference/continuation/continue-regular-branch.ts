import { SubjectError } from '../../expressions/subject-error';
import { BigComplex } from '../complex/big-complex';
import { BigFloat } from '../numbers/big-float';
import { Rational } from '../numbers/rational';
import { continueBranch } from './continue-branch';
import { ContinuationPath, type ExactPoint, type Point } from './continuation-path';
import type { ContinuationRequest } from './continuation-request';
import type { ContinuationResult } from './continuation-result';
import { CutLayout } from './cut-layout';
import { LayoutError } from './layout-error';

/**
 * The continuation engine's in-process API: the regular branch of g(z)^ν fixed at z0, continued
 * along an exact path (docs/regular-branches.md). Every input is validated here; what the engine
 * cannot do (see ContinuationResult) comes back as a refusal, never as an exception.
 */
export function continueRegularBranch(request: ContinuationRequest): ContinuationResult {
  try {
    const { g, nu } = request;
    request.at.forEach((t, i) => {
      if (t.compare(Rational.ZERO) < 0 || t.compare(Rational.ONE) > 0)
        throw new RangeError(`at.${i} must lie in [0, 1]`);
    });
    const spec = request.path;
    if (
      spec.kind === 'circle' &&
      (spec.turns.isZero() || Math.abs(Number(spec.turns.num) / Number(spec.turns.den)) > 64)
    )
      throw new RangeError('path.turns must be non-zero and at most 64');
    const path = new ContinuationPath(spec);
    const layout = request.cuts
      ? CutLayout.build(
          request.cuts.map((c) => ({ points: c.points.map(toPoint), toInfinity: c.toInfinity })),
          g.singularities(),
          nu,
        )
      : null;
    const f0 = request.start.kind === 'value' ? toComplex(request.start.f0) : { k: request.start.k };
    const result = continueBranch({ g, nu, z0: request.z0, f0, path, at: request.at, layout });
    const pathScale = path.scale();
    return {
      kind: 'continued',
      values: request.at.map((t) => {
        const v = result.values.find((r) => r.t.compare(t) === 0) as (typeof result.values)[number];
        return { t, z: settleZeros(v.z, pathScale), f: settleZeros(v.f, 0) };
      }),
      monodromy: result.monodromy ? settleZeros(result.monodromy, 0) : null,
    };
  } catch (e) {
    if (e instanceof SubjectError || e instanceof LayoutError || e instanceof RangeError)
      return { kind: 'refused', reason: e.message };
    throw e;
  }
}

/**
 * A part below max(|c|, scale)·2^−160 is noise of the 192-bit working precision (e.g. Re √i after a
 * quarter turn comes out ~1e−60, not 0): it is set to 0 rather than kept as a meaningless tiny value.
 * For points of the path, `scale` is the path's size, since a point may itself be 0.
 */
function settleZeros(c: BigComplex, scale: number): BigComplex {
  const top = Math.max(c.re.exponent(), c.im.exponent(), scale > 0 ? Math.ceil(Math.log2(scale)) : -Infinity);
  const small = (x: BigFloat) => x.isFinite() && !x.isZero() && x.exponent() < top - 160;
  return new BigComplex(small(c.re) ? BigFloat.ZERO : c.re, small(c.im) ? BigFloat.ZERO : c.im);
}

function toPoint(p: ExactPoint): Point {
  return [Number(p[0].num) / Number(p[0].den), Number(p[1].num) / Number(p[1].den)];
}

function toComplex(p: ExactPoint): BigComplex {
  return new BigComplex(p[0].toBigFloat(256), p[1].toBigFloat(256));
}
