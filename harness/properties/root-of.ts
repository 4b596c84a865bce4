import type { SubjectExpr } from '../expressions/subject-expr';

/** The root a subject is, if its outermost node is one: f = g^(1/n) as sqrt, cbrt, nthroot(g, n) or g^(1/n). */
export function rootOf(expr: SubjectExpr): { n: number; g: SubjectExpr } | null {
  if (expr.kind === 'call' && expr.fn === 'sqrt') return { n: 2, g: expr.arg };
  if (expr.kind === 'call' && expr.fn === 'cbrt') return { n: 3, g: expr.arg };
  if (expr.kind === 'nthroot') return { n: expr.n, g: expr.arg };
  if (expr.kind === 'power' && expr.exponent.num === 1n && expr.exponent.den > 1n)
    return { n: Number(expr.exponent.den), g: expr.base };
  return null;
}
