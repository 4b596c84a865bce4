import type { ComplexPair } from '../../adapters/complex-pair';
import type { SubjectExpr } from '../../expressions/subject-expr';
import { parseDouble } from '../../reference/numbers/parse-double';

/**
 * One step of a subject as a library computes it; `args` index earlier steps. An operation keeps
 * the sub-expression it computes (`node`, for the reference's value of the same step:
 * evaluate-subject.ts) and how it reads as written with the library's operations (`text`,
 * "pow(z, 13)"), so a composed subject's intermediate values can be shown step by step.
 */
export type ProgramStep =
  | { kind: 'input' }
  | { kind: 'const'; value: ComplexPair }
  | { kind: 'op'; op: string; args: number[]; node: SubjectExpr; text: string };

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
  const texts: string[] = ['z'];
  const constant = (value: ComplexPair): number => {
    steps.push({ kind: 'const', value });
    texts.push(constantText(value));
    return steps.length - 1;
  };
  const op = (name: string, args: number[], node: SubjectExpr): number => {
    ops.add(name);
    const text = operationText(
      name,
      args.map((a) => texts[a] as string),
    );
    steps.push({ kind: 'op', op: name, args, node, text });
    texts.push(text);
    return steps.length - 1;
  };
  const walk = (e: SubjectExpr): number => {
    switch (e.kind) {
      case 'z':
        return 0;
      case 'const':
        return constant([parseDouble(e.re.toString()), parseDouble(e.im.toString())]);
      case 'neg':
        return op('neg', [walk(e.a)], e);
      case 'add':
      case 'sub':
      case 'mul':
      case 'div': {
        const a = walk(e.a);
        return op(e.kind, [a, walk(e.b)], e);
      }
      case 'power': {
        const base = walk(e.base);
        return op('pow', [base, constant([parseDouble(e.exponent.toString()), 0])], e);
      }
      case 'complexPower': {
        const base = walk(e.base);
        return op('pow', [base, walk(e.exponent)], e);
      }
      case 'nthroot': {
        const arg = walk(e.arg);
        return op('nthroot', [arg, constant([e.n, 0])], e);
      }
      case 'call':
        return op(e.fn, [walk(e.arg)], e);
    }
  };
  const last = walk(expr);
  // `z` alone: the value is the input itself; keep it the last step.
  if (last !== steps.length - 1) steps.push(steps[last] as ProgramStep);
  return { steps, ops: [...ops] };
}

const INFIX: Readonly<Record<string, string>> = { add: '+', sub: '-', mul: '*', div: '/' };

/** A constant as written in a step: its real part alone when it is real. */
function constantText([re, im]: ComplexPair): string {
  if (im === 0 && !Object.is(im, -0)) return String(re);
  return `(${re} ${im < 0 || Object.is(im, -0) ? '-' : '+'} ${String(Math.abs(im))}i)`;
}

/** A step as written: arithmetic infix and bracketed, functions and powers as calls. */
function operationText(op: string, args: string[]): string {
  const infix = INFIX[op];
  if (infix) return `(${args[0]} ${infix} ${args[1]})`;
  if (op === 'neg') return `-${args[0]}`;
  return `${op}(${args.join(', ')})`;
}
