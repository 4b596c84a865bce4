import type { ComplexPair } from '../../adapters/complex-pair';
import type { SubjectExpr } from '../../expressions/subject-expr';
import { parseDouble } from '../../reference/numbers/parse-double';

/** One step of a subject as a library computes it; `args` index earlier steps. */
export type ProgramStep =
  { kind: 'input' } | { kind: 'const'; value: ComplexPair } | { kind: 'op'; op: string; args: number[] };

/**
 * A subject flattened into library operations, in evaluation order; the last step is the
 * value. The same steps drive the batched evaluation on a target and the reproducers, so a
 * reproducer makes exactly the calls the harness made.
 */
export interface SubjectProgram {
  steps: ProgramStep[];
  /** The operations used, each once, for `supports` checks. */
  ops: string[];
}

/**
 * Flattens a parsed subject into library operations: + − × ÷ and negation become add, sub,
 * mul, div and neg; every power becomes pow with the exponent as a constant argument (a
 * rational exponent as its nearest double, as a user of the library would write it; `z^2` too,
 * since users write `pow(z, 2)` and libraries answer it through their pow); nthroot's degree
 * is the constant n + 0i; catalogue functions are the operation of their name. Constants are
 * the doubles nearest to what was written. The same mapping as harness/properties.
 */
export function subjectProgram(expr: SubjectExpr): SubjectProgram {
  const steps: ProgramStep[] = [{ kind: 'input' }];
  const ops = new Set<string>();
  const constant = (value: ComplexPair): number => {
    steps.push({ kind: 'const', value });
    return steps.length - 1;
  };
  const op = (name: string, args: number[]): number => {
    ops.add(name);
    steps.push({ kind: 'op', op: name, args });
    return steps.length - 1;
  };
  const walk = (e: SubjectExpr): number => {
    switch (e.kind) {
      case 'z':
        return 0;
      case 'const':
        return constant([parseDouble(e.re.toString()), parseDouble(e.im.toString())]);
      case 'neg':
        return op('neg', [walk(e.a)]);
      case 'add':
      case 'sub':
      case 'mul':
      case 'div': {
        const a = walk(e.a);
        return op(e.kind, [a, walk(e.b)]);
      }
      case 'power': {
        const base = walk(e.base);
        return op('pow', [base, constant([parseDouble(e.exponent.toString()), 0])]);
      }
      case 'complexPower': {
        const base = walk(e.base);
        return op('pow', [base, walk(e.exponent)]);
      }
      case 'nthroot': {
        const arg = walk(e.arg);
        return op('nthroot', [arg, constant([e.n, 0])]);
      }
      case 'call':
        return op(e.fn, [walk(e.arg)]);
    }
  };
  const last = walk(expr);
  // `z` alone: the value is the input itself; keep it the last step.
  if (last !== steps.length - 1) steps.push(steps[last] as ProgramStep);
  return { steps, ops: [...ops] };
}
