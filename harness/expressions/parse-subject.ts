import type * as MathJs from 'mathjs';
import { parseNumber } from '../reference/numbers/parse-number';
import { Rational } from '../reference/numbers/rational';
import { mathParse } from './math-parse';
import { ONE_ARGUMENT_FUNCTIONS } from './one-argument-functions';
import { parsePlainCall } from './parse-plain-call';
import { SubjectError } from './subject-error';
import { SUBJECT_LIMITS } from './subject-limits';
import type { SubjectExpr } from './subject-expr';

type MathNode = MathJs.MathNode;

const OPERATORS: Record<string, 'add' | 'sub' | 'mul' | 'div'> = {
  add: 'add',
  subtract: 'sub',
  multiply: 'mul',
  divide: 'div',
};

/**
 * Parses a subject such as `sqrt(z^2 - 1)` or `pow(z, 2/5) * exp(z)` with mathjs's expression
 * parser and keeps it only if every node is on the whitelist. Throws {@link SubjectError}
 * naming the refused construct and the text around it, or the parser's position for a syntax error.
 * A plain call such as `sqrt(z)` is read without mathjs (parsePlainCall), to the same result.
 */
export function parseSubject(text: string): SubjectExpr {
  if (text.length > SUBJECT_LIMITS.length) {
    throw new SubjectError(`subject is ${text.length} characters long; the limit is ${SUBJECT_LIMITS.length}`);
  }
  const plain = parsePlainCall(text);
  if (plain) return plain;
  let root: MathNode;
  try {
    root = mathParse(text);
  } catch (e) {
    throw new SubjectError(`syntax error: ${e instanceof Error ? e.message : String(e)}`);
  }
  let count = 0;
  root.traverse(() => {
    count++;
  });
  if (count > SUBJECT_LIMITS.nodes)
    throw new SubjectError(`subject has ${count} nodes; the limit is ${SUBJECT_LIMITS.nodes}`);
  return convert(root, 0);
}

function refuse(what: string, node: MathNode): never {
  throw new SubjectError(`${what} is not allowed in a subject (at "${node.toString()}")`);
}

function convert(node: MathNode, depth: number): SubjectExpr {
  if (depth > SUBJECT_LIMITS.depth)
    throw new SubjectError(`subject is nested more than ${SUBJECT_LIMITS.depth} deep (at "${node.toString()}")`);
  const n = node as MathNode & Record<string, unknown>;
  switch (node.type) {
    case 'ParenthesisNode':
      return convert(n.content as MathNode, depth + 1);
    case 'ConstantNode':
      return { kind: 'const', re: constantValue(node), im: Rational.ZERO };
    case 'SymbolNode': {
      const name = n.name as string;
      if (name === 'z') return { kind: 'z' };
      if (name === 'i') return { kind: 'const', re: Rational.ZERO, im: Rational.ONE };
      return refuse(`the symbol "${name}" (only z and i are known)`, node);
    }
    case 'OperatorNode': {
      const fn = n.fn as string;
      const args = n.args as MathNode[];
      if (fn === 'unaryMinus') return { kind: 'neg', a: convert(args[0] as MathNode, depth + 1) };
      if (fn === 'unaryPlus') return convert(args[0] as MathNode, depth + 1);
      const op = OPERATORS[fn];
      if (op)
        return { kind: op, a: convert(args[0] as MathNode, depth + 1), b: convert(args[1] as MathNode, depth + 1) };
      if (fn === 'pow') {
        const exponent = rationalConstant(args[1] as MathNode);
        if (!exponent)
          return refuse('a power whose exponent is not an integer or rational constant (use pow(base, w))', node);
        return { kind: 'power', base: convert(args[0] as MathNode, depth + 1), exponent };
      }
      return refuse(`the operator "${n.op as string}"`, node);
    }
    case 'FunctionNode': {
      const fnNode = n.fn as MathNode & { name?: string };
      const name = fnNode.type === 'SymbolNode' ? (fnNode.name as string) : '';
      const args = n.args as MathNode[];
      const arity = (k: number) => {
        if (args.length !== k)
          throw new SubjectError(
            `${name} takes ${k} argument${k > 1 ? 's' : ''}, got ${args.length} (at "${node.toString()}")`,
          );
      };
      if (ONE_ARGUMENT_FUNCTIONS.has(name)) {
        arity(1);
        return { kind: 'call', fn: name, arg: convert(args[0] as MathNode, depth + 1) };
      }
      if (name === 'pow') {
        arity(2);
        const base = convert(args[0] as MathNode, depth + 1);
        const exponent = rationalConstant(args[1] as MathNode);
        if (exponent) return { kind: 'power', base, exponent };
        return { kind: 'complexPower', base, exponent: convert(args[1] as MathNode, depth + 1) };
      }
      if (name === 'nthroot') {
        arity(2);
        const k = rationalConstant(args[1] as MathNode);
        if (!k || !k.isInteger() || k.isZero() || k.num > 1000n || k.num < -1000n) {
          throw new SubjectError(`nthroot needs a non-zero integer degree of at most 1000 (at "${node.toString()}")`);
        }
        return { kind: 'nthroot', arg: convert(args[0] as MathNode, depth + 1), n: Number(k.num) };
      }
      return refuse(`the function "${name || fnNode.toString()}" (not in the catalogue)`, node);
    }
    default:
      return refuse(`a ${node.type}`, node);
  }
}

function constantValue(node: MathNode): Rational {
  const value = (node as unknown as { value: unknown }).value;
  const text =
    value !== null && typeof value === 'object' ? String(value) : typeof value === 'number' ? String(value) : '';
  const parsed = text ? parseNumber(text) : null;
  if (!parsed || parsed.kind !== 'exact') return refuse('a constant that is not a finite number', node);
  return parsed.value;
}

/** The exact value of an exponent built from integer-and-decimal literals with unary ±, ÷ and parentheses. */
function rationalConstant(node: MathNode): Rational | null {
  const n = node as MathNode & Record<string, unknown>;
  if (node.type === 'ParenthesisNode') return rationalConstant(n.content as MathNode);
  if (node.type === 'ConstantNode') return constantValue(node);
  if (node.type === 'OperatorNode') {
    const args = n.args as MathNode[];
    const fn = n.fn as string;
    if (fn === 'unaryMinus') return rationalConstant(args[0] as MathNode)?.negate() ?? null;
    if (fn === 'unaryPlus') return rationalConstant(args[0] as MathNode);
    if (fn === 'divide') {
      const a = rationalConstant(args[0] as MathNode);
      const b = rationalConstant(args[1] as MathNode);
      return a && b && !b.isZero() ? a.div(b) : null;
    }
  }
  return null;
}
