import type { CallResult } from '../adapters/call-result';
import type { ComplexPair } from '../adapters/complex-pair';
import type { Target } from '../adapters/target';
import type { SubjectExpr } from '../expressions/subject-expr';
import { parseDouble } from '../reference/numbers/parse-double';

/**
 * A subject evaluated at many points with the target's own operations, one batch per node of
 * the expression: + − × ÷ and negation go through the library's add, sub, mul, div and neg;
 * powers through its pow (a rational exponent becomes the nearest double, as a user of the
 * library would write it); cbrt, nthroot and the other catalogue functions through the
 * operation of that name. A call that fails at one point fails that point only; its error
 * says which operation failed.
 */
export async function evaluateOnTarget(expr: SubjectExpr, target: Target, points: readonly ComplexPair[]): Promise<CallResult[]> {
  const constant = (pair: ComplexPair): CallResult[] => points.map(() => ({ value: pair }));
  const apply = async (op: string, operands: CallResult[][], extra: ComplexPair[] = []): Promise<CallResult[]> => {
    const results: CallResult[] = points.map(() => ({ error: '' }));
    const calls: ComplexPair[][] = [];
    const where: number[] = [];
    points.forEach((_, i) => {
      const args: ComplexPair[] = [];
      for (const operand of operands) {
        const r = operand[i]!;
        if ('error' in r) {
          results[i] = r;
          return;
        }
        args.push(r.value);
      }
      calls.push([...args, ...extra]);
      where.push(i);
    });
    if (calls.length === 0) return results;
    const answers = await target.evaluate(op, calls);
    answers.forEach((a, k) => {
      results[where[k]!] = 'error' in a ? { error: `${op}: ${a.error}` } : a;
    });
    return results;
  };
  const walk = async (e: SubjectExpr): Promise<CallResult[]> => {
    switch (e.kind) {
      case 'z':
        return points.map((z) => ({ value: [z[0], z[1]] }));
      case 'const':
        return constant([parseDouble(e.re.toString()), parseDouble(e.im.toString())]);
      case 'neg':
        return apply('neg', [await walk(e.a)]);
      case 'add':
      case 'sub':
      case 'mul':
      case 'div':
        return apply(e.kind, [await walk(e.a), await walk(e.b)]);
      case 'power':
        return apply('pow', [await walk(e.base)], [[parseDouble(e.exponent.toString()), 0]]);
      case 'complexPower':
        return apply('pow', [await walk(e.base), await walk(e.exponent)]);
      case 'nthroot':
        return apply('nthroot', [await walk(e.arg)], [[e.n, 0]]);
      case 'call':
        return apply(e.fn, [await walk(e.arg)]);
    }
  };
  return walk(expr);
}
