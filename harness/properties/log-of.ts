import type { SubjectExpr } from '../expressions/subject-expr';

/** The argument g of a subject that is a logarithm log(g), or null. */
export function logOf(expr: SubjectExpr): SubjectExpr | null {
  return expr.kind === 'call' && expr.fn === 'log' ? expr.arg : null;
}
