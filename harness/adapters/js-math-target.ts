import type { TargetEntry } from '../../shared/target-entry';
import { ENTRY_CARRIES } from './entry-carries';
import { evaluateEach } from './evaluate-each';
import { findEntry } from './find-entry';
import { OP_ARITY } from './op-arity';
import type { Target } from './target';

const REAL: Readonly<Record<string, (...x: number[]) => number>> = {
  sqrt: Math.sqrt,
  cbrt: Math.cbrt,
  exp: Math.exp,
  log: Math.log,
  asin: Math.asin,
  acos: Math.acos,
  atan: Math.atan,
  asinh: Math.asinh,
  acosh: Math.acosh,
  atanh: Math.atanh,
  pow: Math.pow,
  add: (a, b) => (a as number) + (b as number),
  sub: (a, b) => (a as number) - (b as number),
  mul: (a, b) => (a as number) * (b as number),
  div: (a, b) => (a as number) / (b as number),
  neg: (a) => -(a as number),
};

/** Math's one entry: a plain number. */
const NUMBER_ENTRY: TargetEntry = {
  name: 'number',
  call: 'a plain number re',
  default: true,
  carries: ENTRY_CARRIES.realOnly,
};

/**
 * JavaScript's `Math` functions (and the real operators) for real-line suites: each
 * argument must have a zero imaginary part, and the result is real with a +0
 * imaginary part. Out-of-domain inputs give what Math gives (NaN), not an error.
 */
export function jsMathTarget(): Target {
  const version = process.versions.node;
  const has = (op: string): boolean => op in OP_ARITY && op in REAL;
  const name = `js-math@${version}`;
  const entries = [NUMBER_ENTRY];
  return {
    name,
    library: 'JavaScript Math',
    version,
    settings: { runtime: 'node', v8: process.versions.v8 },
    entries,
    supports: async (op) => has(op),
    evaluate: async (op, calls, entry) => {
      const fn = REAL[op];
      if (!fn || !has(op)) return calls.map(() => ({ error: `Math has no ${op}` }));
      const found = findEntry({ name, entries }, entry);
      if (found instanceof Error) return calls.map(() => ({ error: found.message }));
      return evaluateEach(op, calls, (args) => {
        const nonReal = args.find(([, im]) => im !== 0);
        if (nonReal) throw new RangeError(`a real-line target takes real arguments, got imaginary part ${nonReal[1]}`);
        return fn(...args.map(([re]) => re));
      });
    },
    close: async () => undefined,
  };
}
