import type { Convention } from '../../shared/schemas/convention-schema';
import { Approximation } from '../reference/complex/approximation';
import { BigComplex } from '../reference/complex/big-complex';
import { evaluateFunction } from '../reference/evaluate-function';
import { applyConvention } from '../reference/functions/apply-convention';
import { pow } from '../reference/functions/pow';
import { parseDouble } from '../reference/numbers/parse-double';
import type { SubjectExpr } from './subject-expr';

const MAX_BITS = 1 << 13;
const STEP = 48;
const LOG2_10 = Math.log2(10);
const NEGATIVE_REAL_AXIS = [{ axis: 'real' as const, from: -Infinity, to: 0, ccwSide: 'upper' as const }];

/**
 * The reference value of a subject at z, every catalogue function on its principal branch
 * under `convention`, with the arithmetic a library does: constants are the doubles nearest
 * to what was written (a rational exponent stays exact), + − × are exact and keep IEEE zero
 * signs, ÷ is rounded.
 *
 * Rounded intermediate values mean no single formula bounds the error, so this uses Ziv's
 * strategy with the common-practice test that two evaluations STEP bits apart agree: the
 * bound on each part is twice their difference, and precision doubles until the double
 * (and `digits` digits) are settled.
 */
export function evaluateSubject(
  expr: SubjectExpr,
  z: BigComplex,
  convention: Convention,
  needs: { double: boolean; digits: number },
  /**
   * When given, filled with the value of every sub-expression (the nodes of `expr`, by identity)
   * from the same two evaluations that settled the whole: a composed subject's intermediate values
   * beside the library's (harness/runner/evaluation/trace-steps.ts). Only the whole is settled;
   * an intermediate value is as good as the working precision that settled it, which exceeds 64
   * bits, so its double may be off by the last bit at a halfway case.
   */
  nodes?: Map<SubjectExpr, Approximation>,
): { approximation: Approximation; double: [number, number]; settled: boolean } {
  const wantBits = needs.digits > 0 ? Math.ceil(needs.digits * LOG2_10) + 4 : 0;
  for (let bits = Math.max(64, wantBits + 8); ; bits *= 2) {
    const coarse = nodes ? new Map<SubjectExpr, BigComplex>() : undefined;
    const fine = nodes ? new Map<SubjectExpr, BigComplex>() : undefined;
    const a = Approximation.agreement(
      toApprox(walk(expr, z, convention, bits, coarse)),
      toApprox(walk(expr, z, convention, bits + STEP, fine)),
    );
    const settled = a.decided(needs.double, wantBits);
    if (settled || bits >= MAX_BITS) {
      if (nodes && coarse && fine)
        for (const [e, v] of fine)
          nodes.set(e, Approximation.agreement(toApprox(coarse.get(e) as BigComplex), toApprox(v)));
      return { approximation: a, double: [a.re.toDouble(), a.im.toDouble()], settled };
    }
  }
}

function toApprox(c: BigComplex): Approximation {
  return new Approximation(c.re, c.im, -Infinity, -Infinity);
}

function walk(
  e: SubjectExpr,
  z: BigComplex,
  convention: Convention,
  bits: number,
  nodes?: Map<SubjectExpr, BigComplex>,
): BigComplex {
  const value = evaluateNode(e, z, convention, bits, nodes);
  nodes?.set(e, value);
  return value;
}

/** One node's value, its operands through `walk` (which records each value in `nodes`). */
const evaluateNode: typeof walk = (e, z, convention, bits, nodes) => {
  const w = bits + 16;
  switch (e.kind) {
    case 'z':
      return z;
    case 'const':
      return BigComplex.fromDoubles(parseDouble(e.re.toString()), parseDouble(e.im.toString()));
    case 'neg':
      return walk(e.a, z, convention, bits, nodes).negate();
    case 'add':
      return walk(e.a, z, convention, bits, nodes)
        .add(walk(e.b, z, convention, bits, nodes))
        .truncate(w + 32);
    case 'sub':
      return walk(e.a, z, convention, bits, nodes)
        .sub(walk(e.b, z, convention, bits, nodes))
        .truncate(w + 32);
    case 'mul':
      return walk(e.a, z, convention, bits, nodes)
        .mul(walk(e.b, z, convention, bits, nodes))
        .truncate(w + 32);
    case 'div': {
      const a = walk(e.a, z, convention, bits, nodes);
      const b = walk(e.b, z, convention, bits, nodes);
      const n = b.norm();
      const num = a.mul(b.conj());
      return new BigComplex(num.re.div(n, w), num.im.div(n, w));
    }
    case 'power': {
      const base = applyConvention(walk(e.base, z, convention, bits, nodes), NEGATIVE_REAL_AXIS, convention);
      return pow(base, { kind: 'rational', value: e.exponent }, w).toComplex();
    }
    case 'complexPower': {
      const base = applyConvention(walk(e.base, z, convention, bits, nodes), NEGATIVE_REAL_AXIS, convention);
      return pow(base, { kind: 'complex', value: walk(e.exponent, z, convention, bits, nodes) }, w).toComplex();
    }
    case 'nthroot':
      return evaluateFunction(
        { fn: 'nthroot', z: walk(e.arg, z, convention, bits, nodes), n: e.n, convention },
        w,
      ).toComplex();
    case 'call':
      return evaluateFunction({ fn: e.fn, z: walk(e.arg, z, convention, bits, nodes), convention }, w).toComplex();
  }
};
