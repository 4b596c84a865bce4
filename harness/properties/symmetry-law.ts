import type { ComplexPair } from '../adapters/complex-pair';
import { checkValue } from '../checks/check-value';
import { onPlaneCut } from '../cuts/on-plane-cut';
import type { SubjectExpr } from '../expressions/subject-expr';
import { evaluateOnTarget } from './evaluate-on-target';
import { libraryValues } from './library-values';
import type { PropertyLaw } from './property-law';

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

const hasZeroPart = ([re, im]: ComplexPair): boolean => re === 0 || im === 0;

/**
 * A symmetry law f(T z) = S f(z), checked on the library's values. Under signed-zero it holds
 * everywhere and sign-exactly (zero signs included), as Annex G requires of the functions it
 * covers. Under counter-clockwise zero signs carry no meaning, so values are compared without
 * them, and where the rule can break the symmetry (a point with a zero part, which is where
 * every catalogue cut lies) the point is excluded. Conjugate symmetry needs a subject with real
 * constants: (z̄)^w = conj(z^w̄), so pow(z, 0.5 + 2i) is not conjugate-symmetric.
 */
export function symmetryLaw(symmetry: Symmetry): PropertyLaw {
  return {
    formula: symmetry.formula,
    source: symmetry.source,
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
      const got = libraryValues(await evaluateOnTarget(ctx.expr, ctx.target, [symmetry.input(z!), z!]), [
        'f(T z)',
        'f(z)',
      ]);
      if ('finding' in got) return got.finding;
      const [left, fz] = got.values as [ComplexPair, ComplexPair];
      const right = symmetry.value(fz);
      const check = checkValue(left, right, ctx.tolerance, ctx.convention === 'signed-zero');
      if (check.pass) return null;
      const why =
        check.zeroSignDiffers.length > 0
          ? `zero sign of ${check.zeroSignDiffers.join(' and ')} differs`
          : check.finitenessDiffers
            ? 'one side is not finite'
            : `${check.ulps} ulps apart`;
      return {
        reason: `${symmetry.formula} fails: ${why}`,
        values: [
          { name: 'left', value: left },
          { name: 'right', value: right },
        ],
      };
    },
  };
}
