import type { ComplexPair } from '../adapters/complex-pair';
import { Rational } from '../reference/numbers/rational';
import { composedClose } from './composed-close';
import { gapText } from './gap-text';
import { evaluateOnTarget } from './evaluate-on-target';
import { lawTolerance } from './law-tolerance';
import { libraryValues } from './library-values';
import type { PropertyLaw } from './property-law';
import { rootOf } from './root-of';

/**
 * f(z)^n = g(z) for a root f = g^(1/n): the defining property of every n-th root (DLMF
 * §4.2(iv)), whichever branch. It cannot tell branches apart; it catches a
 * "root" that is not one (a half-angle from atan(y/x), a mixed-up conjugate). The power is
 * taken with the library's own multiplication, n − 1 products, and g(z) with its own
 * arithmetic. Each product and the root's own rounding add relative error, so the tolerance
 * is n times the suite's; zero signs are not compared (they belong to the products).
 *
 * A power g^(1/n) reaches the library with the exponent rounded to a double w, so its value
 * is g^w, and (g^w)^n = g^(nw) = g·exp((nw − 1)·log g): the law itself then allows a relative
 * error |nw − 1|·|log g| (for 1/3, nw − 1 = −5.6e-17, which at g = 2.5e-294 is 3.8e-14 —
 * measured as the reference's own cube roots failing there without this term).
 */
/** |n·w − 1| for w the double nearest the exponent, exactly: 3 * (1/3) rounds to 1 in doubles. */
function powerMismatch(exponent: Rational, n: number): number {
  const w = Rational.fromDouble(Number(exponent.num) / Number(exponent.den));
  const mismatch = w.mul(new Rational(BigInt(n))).sub(Rational.ONE);
  return Math.abs(Number(mismatch.num) / Number(mismatch.den));
}

export const rootPowerLaw: PropertyLaw = {
  formula: 'f(z)^n = g(z)',
  source: 'definition of the n-th root, DLMF 4.2(iv)',
  allowance:
    '|f(z)^n - g(z)| <= (n t + |n w - 1|(|log g(z)| + pi)) |g(z)|, w the exponent 1/n as a double (1 for a named root)',
  arity: 1,
  ops: () => ['mul'],
  notApplicable: (ctx) => {
    const root = rootOf(ctx.expr);
    if (!root) return 'the subject is not a root (sqrt, cbrt, nthroot or a power 1/n)';
    if (root.n !== ctx.power) return `the check says power ${ctx.power}, the subject is a root of degree ${root.n}`;
    return null;
  },
  excludes: () => false,
  check: async (ctx, [z]) => {
    const root = rootOf(ctx.expr)!;
    const f = libraryValues(await evaluateOnTarget(ctx.expr, ctx.target, [z!]), ['f(z)']);
    if ('finding' in f) return f.finding;
    const g = libraryValues(await evaluateOnTarget(root.g, ctx.target, [z!]), ['g(z)']);
    if ('finding' in g) return g.finding;
    const fz = f.values[0]!;
    let power: ComplexPair = fz;
    for (let k = 1; k < root.n; k += 1) {
      const product = libraryValues(await ctx.target.evaluate('mul', [[power, fz]]), [`f(z)^${k + 1}`]);
      if ('finding' in product) return product.finding;
      power = product.values[0]!;
    }
    const gz = g.values[0]!;
    const exponentError =
      ctx.expr.kind === 'power' && (gz[0] !== 0 || gz[1] !== 0)
        ? powerMismatch(ctx.expr.exponent, root.n) * (Math.abs(Math.log(Math.hypot(...gz))) + Math.PI)
        : 0;
    const bound = root.n * lawTolerance(ctx.tolerance) + exponentError;
    if (composedClose(power, gz, bound, root.n)) return null;
    return {
      reason: `f(z)^${root.n} differs from g(z) ${gapText(power, gz, 'g(z)', bound)}`,
      values: [
        { name: 'f(z)', value: fz },
        { name: `f(z)^${root.n}`, value: power },
        { name: 'g(z)', value: gz },
      ],
      sides: [`f(z)^${root.n}`, 'g(z)'],
    };
  },
};
