import { composedClose } from './composed-close';
import { gapText } from './gap-text';
import { evaluateOnTarget } from './evaluate-on-target';
import { lawTolerance } from './law-tolerance';
import { libraryValues } from './library-values';
import { logOf } from './log-of';
import type { PropertyLaw } from './property-law';

/**
 * exp(log g) = g (exp is the inverse of every branch of the logarithm, DLMF §4.2(iii)
 * as we recall it), with the library's own exp and log. It holds on every branch, so it
 * catches a logarithm whose imaginary part is not an argument of z (atan(y/x) in place of
 * atan2). exp magnifies an absolute error δ in log z into a relative error δ of the result,
 * and log z's own error is about |log z| times its relative error, so the tolerance is the
 * suite's times max(1, |log z|). Zero signs are not compared.
 */
export const expLogLaw: PropertyLaw = {
  formula: 'exp(log z) = z',
  source:
    "DLMF 4.2(iii) and 4.2.6: exp inverts every branch of log (the identity's equation number was not checked against the DLMF text)",
  allowance: '|exp(log z) - z| <= t max(1, |log z|) |z|',
  arity: 1,
  ops: () => ['exp'],
  notApplicable: (ctx) => (logOf(ctx.expr) ? null : 'the subject is not a logarithm log(g)'),
  excludes: () => false,
  check: async (ctx, [z]) => {
    const l = libraryValues(await evaluateOnTarget(ctx.expr, ctx.target, [z!]), ['log z']);
    if ('finding' in l) return l.finding;
    const g = libraryValues(await evaluateOnTarget(logOf(ctx.expr)!, ctx.target, [z!]), ['z']);
    if ('finding' in g) return g.finding;
    const logZ = l.values[0]!;
    const e = libraryValues(await ctx.target.evaluate('exp', [[logZ]]), ['exp(log z)']);
    if ('finding' in e) return e.finding;
    const [back, gz] = [e.values[0]!, g.values[0]!];
    const size = Number.isFinite(logZ[0]) && Number.isFinite(logZ[1]) ? Math.max(1, Math.hypot(...logZ)) : 1;
    const bound = size * lawTolerance(ctx.tolerance);
    if (composedClose(back, gz, bound, 1)) return null;
    return {
      reason: `exp(log z) differs from z ${gapText(back, gz, 'z', bound)}`,
      values: [
        { name: 'log z', value: logZ },
        { name: 'exp(log z)', value: back },
        { name: 'z', value: gz },
      ],
      sides: ['exp(log z)', 'z'],
    };
  },
};
