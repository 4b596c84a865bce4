import { continueRequest } from '../../../shared/schemas/continue-request';
import { parseSubject } from '../../expressions/parse-subject';
import { SubjectError } from '../../expressions/subject-error';
import { BigComplex } from '../complex/big-complex';
import { BigFloat } from '../numbers/big-float';
import { parseNumber } from '../numbers/parse-number';
import type { Rational } from '../numbers/rational';
import { describeRequestError } from '../describe-request-error';
import { continueBranch } from './continue-branch';
import { ContinuationPath, type ExactPoint, type Point } from './continuation-path';
import { CutLayout } from './cut-layout';
import { FactoredFunction } from './factored-function';
import { LayoutError } from './layout-error';
import type { WireComplex } from '../../../shared/wire-complex';

const DIGITS = 40;

/**
 * The answer to one `continue` request (docs/suite-format.md): the regular branch of g(z)^ν fixed by f0
 * at z0 (or by k, f0 = principal·e^{2πiνk}), at each requested t of the path, and the monodromy
 * factor of a closed path; with `cuts`, the values of the branch on that cut plane. Every number
 * here is exact: "0.1" is one tenth, "1/3" a third.
 */
export function answerContinue(input: unknown): Record<string, unknown> {
  const parsed = continueRequest.safeParse(input);
  if (!parsed.success) return describeRequestError(parsed.error);
  const req = parsed.data;
  try {
    const g = FactoredFunction.fromSubject(parseSubject(req.g));
    const nu =
      typeof req.nu === 'string'
        ? { re: exact(req.nu, 'nu'), im: exact('0', 'nu') }
        : { re: exact(req.nu.re, 'nu.re'), im: exact(req.nu.im, 'nu.im') };
    const point = (c: WireComplex, name: string): ExactPoint => [exact(c.re, `${name}.re`), exact(c.im, `${name}.im`)];
    const path =
      req.path.kind === 'circle'
        ? new ContinuationPath({
            kind: 'circle',
            center: point(req.path.center, 'path.center'),
            radius: exact(req.path.radius, 'path.radius'),
            startAngle: exact(req.path.start_angle, 'path.start_angle'),
            turns: req.path.turns,
            ccw: req.path.direction === 'ccw',
          })
        : new ContinuationPath({
            kind: 'polyline',
            points: req.path.points.map((p, i) => point(p, `path.points.${i}`)),
          });
    const at = req.at.map((t, i) => {
      const r = exact(t, `at.${i}`);
      if (r.compare(exact('0', 't')) < 0 || r.compare(exact('1', 't')) > 0)
        throw new RangeError(`at.${i} must lie in [0, 1]`);
      return r;
    });
    const layout = req.cuts
      ? CutLayout.build(
          req.cuts.map((c) => ({
            points: c.points.map((p, i) => toPoint(point(p, `cuts.points.${i}`))),
            toInfinity: c.to_infinity,
          })),
          g.singularities(),
          nu,
        )
      : null;
    const f0 = req.f0 ? toComplex(point(req.f0, 'f0')) : { k: req.k as number };
    const result = continueBranch({ g, nu, z0: point(req.z0, 'z0'), f0, path, at, layout });
    const show = (c: BigComplex, scale = 0) => {
      const c2 = settleZeros(c, scale);
      return { re: c2.re.toDecimal(DIGITS), im: c2.im.toDecimal(DIGITS) };
    };
    const pathScale = path.scale();
    return {
      values: at.map((t, i) => {
        const v = result.values.find((r) => r.t.compare(t) === 0) as (typeof result.values)[number];
        return { t: req.at[i] as string, z: show(v.z, pathScale), f: show(v.f) };
      }),
      monodromy: result.monodromy ? show(result.monodromy) : null,
    };
  } catch (e) {
    if (e instanceof SubjectError || e instanceof LayoutError || e instanceof RangeError) return { error: e.message };
    throw e;
  }
}

/**
 * A part below max(|c|, scale)·2^−160 is noise of the 192-bit working precision (e.g. Re √i after a
 * quarter turn comes out ~1e−60, not 0): it is reported as 0 rather than as 40 meaningless digits.
 * For points of the path, `scale` is the path's size, since a point may itself be 0.
 */
function settleZeros(c: BigComplex, scale: number): BigComplex {
  const top = Math.max(c.re.exponent(), c.im.exponent(), scale > 0 ? Math.ceil(Math.log2(scale)) : -Infinity);
  const small = (x: BigFloat) => x.isFinite() && !x.isZero() && x.exponent() < top - 160;
  return new BigComplex(small(c.re) ? BigFloat.ZERO : c.re, small(c.im) ? BigFloat.ZERO : c.im);
}

function exact(text: string, name: string): Rational {
  const p = parseNumber(text);
  if (p.kind !== 'exact') throw new RangeError(`${name} must be finite`);
  return p.value;
}

function toPoint(p: ExactPoint): Point {
  return [Number(p[0].num) / Number(p[0].den), Number(p[1].num) / Number(p[1].den)];
}

function toComplex(p: ExactPoint): BigComplex {
  return new BigComplex(p[0].toBigFloat(256), p[1].toBigFloat(256));
}
