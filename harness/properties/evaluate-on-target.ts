import type { CallResult } from '../adapters/call-result';
import type { ComplexPair } from '../adapters/complex-pair';
import type { Target } from '../adapters/target';
import type { SubjectExpr } from '../expressions/subject-expr';
import { evaluateProgram } from '../runner/evaluation/evaluate-program';
import { subjectProgram } from '../runner/evaluation/subject-program';

/**
 * A subject (or a part of one, such as the argument g of a root) evaluated at a few points with
 * the target's own operations, exactly as the runner evaluates suites (subject-program.ts,
 * evaluate-program.ts), one result per point: the value, or why there is none.
 */
export async function evaluateOnTarget(
  expr: SubjectExpr,
  target: Target,
  points: readonly ComplexPair[],
): Promise<CallResult[]> {
  const column = await evaluateProgram(
    subjectProgram(expr),
    target,
    Float64Array.from(points, (p) => p[0]),
    Float64Array.from(points, (p) => p[1]),
  );
  return points.map((_, i) => {
    const error = column.errors.get(i);
    return error !== undefined ? { error } : { value: [column.re[i]!, column.im[i]!] };
  });
}
