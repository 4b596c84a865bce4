import type { ComplexPair } from '../adapters/complex-pair';
import { BigComplex } from '../reference/complex/big-complex';
import { lawTolerance } from './law-tolerance';
import { libraryValues } from './library-values';
import type { PropertyLaw } from './property-law';

const TWO_PI = 2 * Math.PI;
/** Below the least normal double a rounded product carries more than 2^−53 relative error. */
const MIN_NORMAL = 2 ** -1022;

/** The unwinding number K(w) = ⌈(Im w − π) / 2π⌉ (Corless and Jeffrey, "The unwinding number", SIGSAM Bulletin 30(2), 1996; the paper was not read, the formula not checked against it). */
function unwinding(w: ComplexPair): number {
  return Math.ceil((w[1] - Math.PI) / TWO_PI);
}

/**
 * log(z1·z2) = log z1 + log z2 − 2πi·K(log z1 + log z2), K the unwinding number of Corless
 * and Jeffrey, with the library's log at z1, z2 and at their product. The product is the exact
 * one rounded once (the reference's exact arithmetic), so the law is about log and not about
 * the library's multiplication.
 *
 * Where Im(log z1 + log z2) is an odd multiple of π to within the tolerance, the product lies
 * on or next to the cut, and which side it is on decides the sign of Im log(z1·z2); rounding in
 * the two logs cannot decide it. There the expected imaginary part takes the sign of Im(z1·z2):
 * the sign of its zero under signed-zero (Annex G), +π for a zero under counter-clockwise
 * (Kahan). Products that are infinite or below the least normal double (zero included) are
 * excluded: the identity is between finite logarithms, and a subnormal product is rounded by
 * up to half its size, which moves its logarithm by far more than any tolerance. The real parts sum logarithms of sizes, so the tolerance is absolute,
 * the suite's times |log z1| + |log z2| + π. Zero signs are not compared.
 */
export const unwindingLaw: PropertyLaw = {
  formula: 'log(z1*z2) = log z1 + log z2 - 2*pi*i*K(log z1 + log z2)',
  source:
    'Corless & Jeffrey 1996, the unwinding number K(w) = ceil((Im w - pi)/(2 pi)) (formula not checked against the paper)',
  allowance: '|log(z1*z2) - (log z1 + log z2 - 2*pi*i*K)| <= t(|log z1| + |log z2| + pi)',
  arity: 2,
  ops: () => [],
  notApplicable: (ctx) =>
    ctx.expr.kind === 'call' && ctx.expr.fn === 'log' && ctx.expr.arg.kind === 'z'
      ? null
      : 'the unwinding identity is stated for the subject log(z)',
  excludes: (_ctx, [z1, z2]) => {
    const p = exactProduct(z1!, z2!);
    return !(Number.isFinite(p[0]) && Number.isFinite(p[1])) || Math.hypot(...p) < MIN_NORMAL;
  },
  check: async (ctx, [z1, z2]) => {
    const p = exactProduct(z1!, z2!);
    const got = libraryValues(await ctx.target.evaluate('log', [[z1!], [z2!], [p]]), [
      'log z1',
      'log z2',
      'log(z1*z2)',
    ]);
    if ('finding' in got) return got.finding;
    const [l1, l2, lp] = got.values as [ComplexPair, ComplexPair, ComplexPair];
    const sum: ComplexPair = [l1[0] + l2[0], l1[1] + l2[1]];
    const k = unwinding(sum);
    const tol = lawTolerance(ctx.tolerance) * (Math.hypot(...l1) + Math.hypot(...l2) + Math.PI);
    let im = sum[1] - TWO_PI * k;
    if (Math.abs(Math.abs(im) - Math.PI) <= tol) {
      const upper = p[1] > 0 || (p[1] === 0 && (ctx.convention === 'counter-clockwise' || !Object.is(p[1], -0)));
      im = upper ? Math.abs(im) : -Math.abs(im);
    }
    const expected: ComplexPair = [sum[0], im];
    const right = `log z1 + log z2 - 2*pi*i*(${k})`;
    const values = [
      { name: 'z1*z2', value: p },
      { name: 'log z1', value: l1 },
      { name: 'log z2', value: l2 },
      { name: 'log(z1*z2)', value: lp },
      { name: right, value: expected },
    ];
    const sides: [string, string] = ['log(z1*z2)', right];
    if (![...lp, ...expected].every(Number.isFinite)) return { reason: 'a logarithm is not finite', values, sides };
    const gap = Math.hypot(lp[0] - expected[0], lp[1] - expected[1]);
    if (gap <= tol) return null;
    return {
      reason: `log(z1*z2) differs from log z1 + log z2 - 2*pi*i*K with K = ${k} by ${gap.toPrecision(3)}, over the ${tol.toPrecision(3)} allowed`,
      values,
      sides,
    };
  },
};

/** z1·z2 exactly, rounded once per part (IEEE zero signs kept by the exact arithmetic). */
function exactProduct(z1: ComplexPair, z2: ComplexPair): ComplexPair {
  const p = BigComplex.fromDoubles(z1[0], z1[1]).mul(BigComplex.fromDoubles(z2[0], z2[1]));
  return [p.re.toDouble(), p.im.toDouble()];
}
