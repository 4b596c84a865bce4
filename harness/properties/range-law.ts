import type { ComplexPair } from '../adapters/complex-pair';
import { catalogueCuts } from '../cuts/catalogue-cuts';
import { onPlaneCut } from '../cuts/on-plane-cut';
import type { PlaneCut } from '../cuts/plane-cut';
import type { SubjectExpr } from '../expressions/subject-expr';
import { evaluateOnTarget } from './evaluate-on-target';
import { lawTolerance } from './law-tolerance';
import { libraryValues } from './library-values';
import { PRINCIPAL_RANGE } from './principal-range';
import type { PropertyLaw } from './property-law';
import type { RangeCondition } from './range-condition';

/** The range conditions of the subject's outermost function, its argument g and its cuts; null when it has no principal range. */
function rangeOf(
  expr: SubjectExpr,
): { conditions: readonly RangeCondition[]; g: SubjectExpr; cuts: PlaneCut[] } | null {
  const powerRange = (w: number, g: SubjectExpr) => ({
    // arg z^w = w·Arg z with |Arg z| ≤ π, a range only while |w| < 1 (DLMF 4.2.26 with 4.2(i); 4.2.26 not checked against the text).
    conditions: [{ part: 'arg' as const, min: -Math.PI * Math.abs(w), max: Math.PI * Math.abs(w), ccwOpenMin: true }],
    g,
    cuts: catalogueCuts('pow') ?? [],
  });
  if (expr.kind === 'call' && expr.fn === 'cbrt') return powerRange(1 / 3, expr.arg);
  if (expr.kind === 'call' && PRINCIPAL_RANGE[expr.fn])
    return { conditions: PRINCIPAL_RANGE[expr.fn]!, g: expr.arg, cuts: catalogueCuts(expr.fn) ?? [] };
  if (expr.kind === 'nthroot' && Math.abs(expr.n) >= 2) return powerRange(1 / expr.n, expr.arg);
  if (expr.kind === 'power') {
    const w = Number(expr.exponent.num) / Number(expr.exponent.den);
    if (!expr.exponent.isInteger() && Math.abs(w) < 1) return powerRange(w, expr.base);
  }
  return null;
}

function partOf([re, im]: ComplexPair, part: RangeCondition['part']): number | null {
  if (part === 're') return re;
  if (part === 'im') return im;
  // A zero value has no argument; it is in every sector.
  return re === 0 && im === 0 ? null : Math.atan2(im, re);
}

/**
 * The value lies in the principal range of the subject's outermost function (DLMF §4.2(i),
 * §4.23(ii), §4.37(ii); for powers arg f ∈ [−π|w|, π|w|]), on the library's values. Edges are
 * closed, with a slack of the suite's tolerance (Math.PI lies below π, and a library may
 * round an edge value outwards by an ulp). Under counter-clockwise, where the function's own
 * argument g(z) lies exactly on its cut, the rule closes the cut from above, so a range DLMF
 * writes half-open (−π < Im log ≤ π, and the same for √ and powers) must not reach its
 * lower edge there. A NaN part is outside every range.
 */
export const rangeLaw: PropertyLaw = {
  formula: 'f(z) in the principal range of f',
  source: 'DLMF 4.2(i), 4.23(ii), 4.37(ii); half-open edges per Kahan (1987) under counter-clockwise',
  allowance: 'each edge e of the range widened by t(|e| + 1)',
  arity: 1,
  ops: () => [],
  notApplicable: (ctx) =>
    rangeOf(ctx.expr)
      ? null
      : 'the outermost function of the subject has no principal range to check (not a catalogue inverse, log, root or power |w| < 1)',
  excludes: () => false,
  check: async (ctx, [z]) => {
    const range = rangeOf(ctx.expr)!;
    const got = libraryValues(await evaluateOnTarget(ctx.expr, ctx.target, [z!]), ['f(z)']);
    if ('finding' in got) return got.finding;
    const value = got.values[0]!;
    const tol = lawTolerance(ctx.tolerance);
    let onCut: ComplexPair | null = null;
    if (ctx.convention === 'counter-clockwise' && range.conditions.some((c) => c.ccwOpenMin)) {
      const g = libraryValues(await evaluateOnTarget(range.g, ctx.target, [z!]), ['g(z)']);
      if ('finding' in g) return g.finding;
      if (range.cuts.some((cut) => onPlaneCut(cut, g.values[0]!))) onCut = g.values[0]!;
    }
    for (const c of range.conditions) {
      const x = partOf(value, c.part);
      if (x === null) continue;
      const slack = (edge: number) => (Number.isFinite(edge) ? Math.abs(edge) * tol + tol : 0);
      const inside = x >= c.min - slack(c.min) && x <= c.max + slack(c.max);
      if (!inside)
        return { reason: `${c.part} f(z) = ${x} lies outside [${c.min}, ${c.max}]`, values: [{ name: 'f(z)', value }] };
      if (onCut && c.ccwOpenMin && x <= c.min + slack(c.min)) {
        return {
          reason: `${c.part} f(z) = ${x} is the lower edge, which the counter-clockwise rule leaves open on the cut`,
          values: [
            { name: 'g(z)', value: onCut },
            { name: 'f(z)', value },
          ],
        };
      }
    }
    return null;
  },
};
