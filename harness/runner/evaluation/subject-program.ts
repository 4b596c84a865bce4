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
  // Each step's text, and whether it reads as one term (a name, a call, a bracket, a number ≥ 0).
  const texts: StepText[] = [{ text: 'z', term: true }];
  const constant = (value: ComplexPair): number => {
    steps.push({ kind: 'const', value });
    texts.push(constantText(value));
    return steps.length - 1;
  };
  const op = (name: string, args: number[], node: SubjectExpr): number => {
    ops.add(name);
    const text = operationText(
      name,
      args.map((a) => texts[a] as StepText),
    );
    steps.push({ kind: 'op', op: name, args, node, text: text.text });
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

interface StepText {
  text: string;
  term: boolean;
}

/** An operand of an operator: bracketed unless it reads as one term. */
const operand = (t: StepText): string => (t.term ? t.text : `(${t.text})`);

/** A constant as written in a step: its real part alone when it is real, else bracketed. */
function constantText([re, im]: ComplexPair): StepText {
  if (im === 0 && !Object.is(im, -0)) return { text: String(re), term: re >= 0 && !Object.is(re, -0) };
  return { text: `(${re} ${im < 0 || Object.is(im, -0) ? '-' : '+'} ${String(Math.abs(im))}i)`, term: true };
}

/** A step as written: arithmetic infix with bracketed operands, functions and powers as calls. */
function operationText(op: string, args: StepText[]): StepText {
  const infix = INFIX[op];
  if (infix) return { text: `${operand(args[0] as StepText)} ${infix} ${operand(args[1] as StepText)}`, term: false };
  if (op === 'neg') return { text: `-${operand(args[0] as StepText)}`, term: false };
  return { text: `${op}(${args.map((a) => a.text).join(', ')})`, term: true };
}
