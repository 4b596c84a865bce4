import type { Suite } from '../../../shared/schemas/suite-schema';
import type { SuitePath } from '../../../shared/schemas/suite-path-schema';
import type { ComplexDouble } from '../../checks/complex-double';
import { CUT_CONVENTION_RULE, FUNCTION_RULES } from '../../checks/function-rules';
import { otherSheets } from '../../checks/other-sheets';
import { relativeError } from '../../checks/relative-error';
import { evaluateSubject } from '../../expressions/evaluate-subject';
import type { SubjectExpr } from '../../expressions/subject-expr';
import type { PathPoint } from '../../paths/path-point';
import { BigComplex } from '../../reference/complex/big-complex';
import { parseDouble } from '../../reference/numbers/parse-double';
import { principalDouble } from '../../reference/principal-double';
import { principalValue } from '../../reference/principal-value';
import type { Convention } from '../../../shared/schemas/convention-schema';
import type { ExpectedColumn, Expectation, PointAlternatives } from './expectation';
import type { ReferenceCache } from '../reference-cache/reference-cache';
import { straddlePairs } from './straddle-pairs';
import { subjectSheetFamily } from './subject-sheet-family';

/** Cache kinds: the suite's convention, signed-zero (for one-sided limits under counter-clockwise), and a refusal marker. */
const KIND_SUITE = 0;
const KIND_SIGNED_ZERO = 1;
const KIND_REFUSED = 15;
/** Two sides of a cut differ by more than this (relative) where there is a cut: a jump, not a slope. */
const CUT_JUMP = 1e-3;

type Compute = (re: number, im: number, convention: Convention) => ComplexDouble;

/**
 * How to compute the reference for a subject as fast as it can be done exactly: one catalogue
 * function of z goes through principalDouble (its double-double tier when that settles the
 * rounding); a power or root of z through principalValue; anything else through
 * evaluateSubject (bigint arithmetic for the whole subject).
 */
function computeFor(expr: SubjectExpr): Compute {
  const fromDoubles = BigComplex.fromDoubles;
  const onZ = (e: SubjectExpr) => e.kind === 'z';
  const needs = { double: true, digits: 0 };
  if (expr.kind === 'call' && onZ(expr.arg)) {
    const fn = expr.fn;
    return (re, im, convention) => principalDouble(fn, re, im, convention);
  }
  if (expr.kind === 'nthroot' && onZ(expr.arg)) {
    const n = expr.n;
    return (re, im, convention) =>
      principalValue({ fn: 'nthroot', z: fromDoubles(re, im), n, convention }, needs).double;
  }
  if (expr.kind === 'power' && onZ(expr.base)) {
    const w = { kind: 'rational' as const, value: expr.exponent };
    return (re, im, convention) => principalValue({ fn: 'pow', z: fromDoubles(re, im), w, convention }, needs).double;
  }
  if (expr.kind === 'complexPower' && onZ(expr.base) && expr.exponent.kind === 'const') {
    const c = expr.exponent;
    const value = BigComplex.fromDoubles(parseDouble(c.re.toString()), parseDouble(c.im.toString()));
    return (re, im, convention) =>
      principalValue({ fn: 'pow', z: fromDoubles(re, im), w: { kind: 'complex', value }, convention }, needs).double;
  }
  return (re, im, convention) => evaluateSubject(expr, fromDoubles(re, im), convention, needs).double;
}

/** The outermost catalogue function of a subject (through negations), for the rule table. */
function outerFunction(expr: SubjectExpr): string | null {
  switch (expr.kind) {
    case 'neg':
      return outerFunction(expr.a);
    case 'call':
      return expr.fn;
    case 'nthroot':
      return 'nthroot';
    case 'power':
      return expr.exponent.isInteger() ? null : 'pow';
    case 'complexPower':
      return 'pow';
    default:
      return null;
  }
}

/**
 * The expectation of a principal suite: every function of the subject on its principal branch
 * under the suite's convention, the whole subject evaluated exactly and rounded once
 * (harness/expressions/evaluate-subject.ts). Alternatives: the reference with an input zero
 * flipped (signed-zero only); both one-sided limits on an axis where they differ (the
 * signed-zero reference at +0 and at −0); on a straddle path the value at the mirror point
 * across the cut; and the other sheets of the outermost function.
 */
export function principalExpectation(
  suite: Suite,
  expr: SubjectExpr,
  cache: ReferenceCache,
  cacheKey: string,
): Expectation {
  const compute = computeFor(expr);
  const family = subjectSheetFamily(expr);
  const outer = outerFunction(expr);
  const simple =
    expr.kind === 'call' || expr.kind === 'nthroot'
      ? expr.arg.kind === 'z'
      : expr.kind === 'power' || expr.kind === 'complexPower'
        ? expr.base.kind === 'z'
        : false;
  const refusals = new Map<string, string>();
  const out = [0, 0];

  const value = (re: number, im: number, convention: Convention): ComplexDouble => {
    const kind = convention === suite.convention ? KIND_SUITE : KIND_SIGNED_ZERO;
    if (cache.get(cacheKey, kind, re, im, out)) return [out[0] as number, out[1] as number];
    if (cache.get(cacheKey, KIND_REFUSED + kind, re, im, out))
      throw new Error(refusals.get(`${re},${im}`) ?? 'the reference engine has no value here');
    try {
      const v = compute(re, im, convention);
      cache.put(cacheKey, kind, re, im, v[0], v[1]);
      return v;
    } catch (e) {
      const message = `reference: ${e instanceof Error ? e.message : String(e)}`;
      refusals.set(`${re},${im}`, message);
      cache.put(cacheKey, KIND_REFUSED + kind, re, im, NaN, NaN);
      throw new Error(message);
    }
  };

  const rule = (p: PathPoint, onCut: boolean): string => {
    const r = outer ? FUNCTION_RULES[outer] : undefined;
    const whole = simple
      ? ''
      : `; the subject ${suite.subject} with every function on its principal branch, + − × exact and ÷ rounded, rounded once`;
    if (![p.z.re, p.z.im].every(Number.isFinite))
      return `${r?.annexG ?? CUT_CONVENTION_RULE['signed-zero']} (special values)${whole}`;
    if (onCut)
      return `${suite.convention === 'signed-zero' ? (r?.annexG ?? CUT_CONVENTION_RULE['signed-zero']) : (r?.counterClockwise ?? CUT_CONVENTION_RULE['counter-clockwise'])}${whole}`;
    return `${r?.definition ?? 'principal branch of every function in the subject'}${whole}`;
  };

  const pairsByPath = new WeakMap<readonly PathPoint[], number[]>();

  return {
    zeroSigns: suite.convention === 'signed-zero',
    description: `principal branch of every function, ${suite.convention}`,
    expected(_path: SuitePath, points: readonly PathPoint[]): ExpectedColumn {
      const n = points.length;
      const col: ExpectedColumn = { re: new Float64Array(n), im: new Float64Array(n), skipped: new Map() };
      for (let i = 0; i < n; i++) {
        const { re, im } = (points[i] as PathPoint).z;
        try {
          const v = value(re, im, suite.convention);
          col.re[i] = v[0];
          col.im[i] = v[1];
        } catch (e) {
          col.skipped.set(i, e instanceof Error ? e.message : String(e));
        }
      }
      return col;
    },
    alternatives(
      path: SuitePath,
      points: readonly PathPoint[],
      index: number,
      expected: ComplexDouble,
    ): PointAlternatives {
      const p = points[index] as PathPoint;
      const { re, im } = p.z;
      const alt: PointAlternatives = { rule: '' };
      const tryValue = (x: number, y: number, c: Convention): ComplexDouble | null => {
        try {
          return value(x, y, c);
        } catch {
          return null;
        }
      };
      if (suite.convention === 'signed-zero' && (re === 0 || im === 0)) {
        const part = im === 0 ? 'im' : 're';
        const flipped = part === 'im' ? tryValue(re, -im, 'signed-zero') : tryValue(-re, im, 'signed-zero');
        if (flipped) alt.flippedZero = { part, value: flipped };
      }
      let onCut = false;
      // On an axis (0 included: it lies on acosh's cut), the one-sided limits are the signed-zero
      // values with that zero's sign set each way; where they differ the point is on a cut.
      for (const imZero of [true, false]) {
        if (onCut || !Number.isFinite(re) || !Number.isFinite(im) || (imZero ? im !== 0 : re !== 0)) continue;
        const plus = imZero ? tryValue(re, 0, 'signed-zero') : tryValue(0, im, 'signed-zero');
        const minus = imZero ? tryValue(re, -0, 'signed-zero') : tryValue(-0, im, 'signed-zero');
        if (plus && minus && relativeError(plus, minus) > 1e-9) {
          onCut = true;
          alt.limits = {
            sides: imZero
              ? ['from above (Im z = +0)', 'from below (Im z = −0)']
              : ['from the right (Re z = +0)', 'from the left (Re z = −0)'],
            values: [plus, minus],
          };
          alt.otherSide = relativeError(plus, expected) >= relativeError(minus, expected) ? plus : minus;
        }
      }
      if (!onCut && path.kind === 'straddle') {
        let pairs = pairsByPath.get(points);
        if (!pairs) pairsByPath.set(points, (pairs = straddlePairs(points)));
        const j = pairs[index] as number;
        if (j >= 0) {
          const q = (points[j] as PathPoint).z;
          const mirror = tryValue(q.re, q.im, suite.convention);
          if (mirror && relativeError(mirror, expected) > CUT_JUMP) alt.otherSide = mirror;
        }
      }
      if (family) alt.otherSheets = otherSheets(family, expected);
      alt.rule = rule(p, onCut);
      return alt;
    },
    monodromy(): null {
      return null;
    },
  };
}
