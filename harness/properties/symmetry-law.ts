import type { ComplexPair } from '../adapters/complex-pair';
import { comparePart } from '../checks/compare-part';
import { onPlaneCut } from '../cuts/on-plane-cut';
import type { SubjectExpr } from '../expressions/subject-expr';
import { composedClose } from './composed-close';
import { evaluateOnTarget } from './evaluate-on-target';
import { lawTolerance } from './law-tolerance';
import type { LawFinding } from './law-finding';
import { libraryValues } from './library-values';
import type { PropertyLaw } from './property-law';
import { subjectSensitivity } from './subject-sensitivity';

/** How a symmetry maps the input and the value: z ↦ z̄ with f ↦ conj f, or z ↦ −z with f ↦ −f or f. */
interface Symmetry {
  formula: string;
  source: string;
  input(z: ComplexPair): ComplexPair;
  value(f: ComplexPair): ComplexPair;
  /**
   * Whether Kahan's counter-clockwise rule can break the law on any cut. When false it can
   * still break it on a cut whose closed side the catalogue does not name (a cut through 0
   * such as acot's, where z and −z lie on the same cut and get the same side).
   */
  brokenOnCutsByCcw: boolean;
  /** Whether the law needs the subject to be real on the real axis (true for conjugation). */
  needsRealConstants: boolean;
}

const hasNonRealConstant = (e: SubjectExpr): boolean => {
  switch (e.kind) {
    case 'z':
      return false;
    case 'const':
      return !e.im.isZero();
    case 'neg':
      return hasNonRealConstant(e.a);
    case 'add':
    case 'sub':
    case 'mul':
    case 'div':
      return hasNonRealConstant(e.a) || hasNonRealConstant(e.b);
    case 'power':
      return hasNonRealConstant(e.base);
    case 'complexPower':
      return hasNonRealConstant(e.base) || hasNonRealConstant(e.exponent);
    case 'nthroot':
    case 'call':
      return hasNonRealConstant(e.arg);
  }
};

/** The least positive normal double: below it a part carries absolute, not relative, error. */
const MIN_NORMAL = 2 ** -1022;

const hasZeroPart = ([re, im]: ComplexPair): boolean => re === 0 || im === 0;

/**
 * A symmetry law f(T z) = S f(z), checked on the library's values. Under signed-zero it holds
 * everywhere and sign-exactly (the signs of zero parts included), as Annex G requires of the
 * functions it covers; nonzero values are compared normwise, within twice the tolerance times
 * the size and sensitivity of f at z. Under counter-clockwise zero signs carry no meaning, so
 * values are compared without them, and where the rule can break the symmetry (a point with a
 * zero part, which is where every catalogue cut lies) the point is excluded. Conjugate symmetry needs a subject with real
 * constants: (z̄)^w = conj(z^w̄), so pow(z, 0.5 + 2i) is not conjugate-symmetric.
 */
export function symmetryLaw(symmetry: Symmetry): PropertyLaw {
  return {
    formula: symmetry.formula,
    source: symmetry.source,
    allowance:
      "|left - right| <= 2t(|f(z)| + |z f'(z)|), and no part of opposite signs on the two sides beyond 2t|f(z)|; zero signs exact under signed-zero",
    arity: 1,
    ops: () => [],
    notApplicable: (ctx) =>
      symmetry.needsRealConstants && hasNonRealConstant(ctx.expr)
        ? `the subject has a non-real constant, so ${symmetry.formula} need not hold`
        : null,
    excludes: (ctx, [z]) => {
      if (ctx.convention !== 'counter-clockwise' || !hasZeroPart(z!)) return false;
      if (symmetry.brokenOnCutsByCcw || ctx.cuts === null) return true;
      return ctx.cuts.some((cut) => cut.ccwSide === null && onPlaneCut(cut, z!, true));
    },
    check: async (ctx, [z]) => {
      const [leftName, rightName] = symmetry.formula.split(' = ') as [string, string];
      const got = libraryValues(await evaluateOnTarget(ctx.expr, ctx.target, [symmetry.input(z!), z!]), [
        leftName,
        'f(z)',
      ]);
      if ('finding' in got) return got.finding;
      const [left, fz] = got.values as [ComplexPair, ComplexPair];
      const right = symmetry.value(fz);
      const sides = [
        { name: leftName, value: left },
        { name: rightName, value: right },
      ];
      const fail = (why: string): LawFinding => ({
        reason: `${symmetry.formula} fails: ${why}`,
        values: sides,
        sides: [leftName, rightName],
      });
      const parts = [comparePart(left[0], right[0]), comparePart(left[1], right[1])] as const;
      const signs = (['re', 'im'] as const).filter((_, i) => parts[i]!.zeroSignDiffers);
      // An infinity or NaN that differs says more than a zero sign, so it is named first.
      if (parts.some((p) => p.finitenessDiffers))
        return fail('a part is infinite or NaN on one side and not the same on the other');
      if (ctx.convention === 'signed-zero' && signs.length > 0)
        return fail(`zero sign of ${signs.join(' and ')} differs`);
      if (![...left, ...right].every(Number.isFinite)) return null;
      // Both sides are library values, and z ↦ z̄, z ↦ −z and the value maps are exact. A
      // backward-stable library is within t·(|f| + |z·f′(z)|) of f at z (its rounding, and the
      // first-order effect of a relative change t of z; the second term is the condition of f,
      // subject-sensitivity.ts), and so at the mirrored point: the sides may differ by twice
      // that. Measured on complex.js 2.4.3: per part in ulps a part far below the other is
      // noise (acos(−1.000000000000005 ± 5e−324i) has imaginary parts 1.0106459225e−7 and
      // 1.0106459236e−7 beside π, 8,388,607 ulps apart and 3.5e−17 of |f|); without the
      // sensitivity atan(±i·1.000000000000214), where |z·f′|/|f| = 1.6e11, failed at 16 ulps
      // from mpmath on each side. A sign or branch error moves a value by far more.
      const t = lawTolerance(ctx.tolerance);
      // A part whose sign differs between the sides by more than rounding is a wrong side or
      // sign, whatever the sensitivity: a relative change of each part of z keeps z on its side
      // of every cut, and next to a branch point a part of f can reach zero but not cross it
      // (complex.js acosh(0.9999999999999981 ± 0i) has Im 6.1e−8 for both zeros: the sides differ
      // by 1.23e−7 against a sensitivity allowance of 1.16e−7, and nearer the branch point the
      // allowance outgrows any such gap).
      const flipped = (['re', 'im'] as const).filter(
        (_, i) =>
          Math.sign(left[i]!) * Math.sign(right[i]!) < 0 &&
          Math.abs(left[i]! - right[i]!) > 2 * t * Math.hypot(...right) + 2 * MIN_NORMAL,
      );
      if (flipped.length > 0)
        return fail(`the ${flipped.join(' and ')} parts of the sides have opposite signs, by more than rounding`);
      const sensitivity = subjectSensitivity(ctx.expr, z!, fz);
      if (composedClose(left, right, 2 * t, 2, 2 * t * sensitivity)) return null;
      const size = Math.hypot(...right);
      const allowed = 2 * t * (size + sensitivity);
      return fail(
        `|${leftName} − ${rightName}| = ${Math.hypot(left[0] - right[0], left[1] - right[1]).toPrecision(3)}, over the ${allowed.toPrecision(3)} allowed: 2t(|f(z)| + |z·f′(z)|) with t = ${t.toPrecision(3)}, |f(z)| = ${size.toPrecision(3)}, |z·f′(z)| = ${sensitivity.toPrecision(3)} (one library value on each side)`,
      );
    },
  };
}
