import type { ComplexPair } from './complex-pair';
import { evaluateColumns } from './evaluate-columns';
import { evaluateEach } from './evaluate-each';
import { OP_ARITY } from './op-arity';
import type { Target } from './target';
import { withExactParts } from './with-exact-parts';

type MathFunction = (...args: unknown[]) => unknown;
type MathInstance = Record<string, unknown> & { complex(re: number, im: number): { re: number; im: number } };

/** mathjs's function names where they differ from the catalogue's. */
const FUNCTION: Readonly<Record<string, string>> = {
  nthroot: 'nthRoot',
  add: 'add',
  sub: 'subtract',
  mul: 'multiply',
  div: 'divide',
  neg: 'unaryMinus',
};

/**
 * mathjs at one installed version, in its own instance `create(all, { predictable })`.
 *
 * Entry point `complex`: every argument goes in as `math.complex(re, im)` (parts set
 * exactly afterwards, with-exact-parts.ts). Entry point `number`: an argument
 * with a zero imaginary part (either sign) goes in as the plain number re, the way
 * real-line code calls mathjs; others still go in as complex. So the number entry
 * point cannot see the sign of a zero imaginary part, which is the point of testing
 * it: `sqrt(-4)` is 2i with predictable off and NaN with predictable on.
 * nthroot's degree always goes in as a number. Loaded with `require` on first use:
 * `require('mathjs')` costs about a second (docs/conventions.md).
 */
export function mathjsTarget(
  alias: string,
  version: string,
  entry: 'complex' | 'number',
  predictable: boolean,
  complexJsVersion: string,
): Target {
  let math: MathInstance | undefined;
  const load = (): MathInstance => {
    if (math) return math;
    // Required here, not imported: a run against another library never pays for mathjs.
    // eslint-disable-next-line @typescript-eslint/no-require-imports -- a lazy load of a package chosen at run time
    const mod = require(alias) as { create(factories: unknown, config: unknown): MathInstance; all: unknown };
    math = mod.create(mod.all, { predictable });
    return math;
  };
  const functionOf = (op: string): string => FUNCTION[op] ?? op;
  const has = (op: string): boolean => op in OP_ARITY && typeof load()[functionOf(op)] === 'function';
  const argument = (z: ComplexPair): unknown =>
    entry === 'number' && z[1] === 0 ? z[0] : withExactParts(load().complex(z[0], z[1]), z);
  return {
    name: `mathjs@${version}/${entry}${predictable ? '/predictable' : ''}`,
    library: 'mathjs',
    version,
    settings: { package: alias, entry, predictable, 'complex.js': complexJsVersion },
    supports: async (op) => has(op),
    evaluate: async (op, calls) => {
      if (!has(op)) return calls.map(() => ({ error: `mathjs ${version} has no ${functionOf(op)}` }));
      const fn = load()[functionOf(op)] as MathFunction;
      return evaluateEach(op, calls, (args) => {
        const [z, n] = args as [ComplexPair, ComplexPair | undefined];
        if (op === 'nthroot' && n) return fn(argument(z), n[0]);
        return fn(...args.map(argument));
      });
    },
    evaluateColumns: async (op, args, n, skip) => {
      if (!has(op))
        return evaluateColumns(op, args, n, skip, () => {
          throw new Error(`mathjs ${version} has no ${functionOf(op)}`);
        });
      const fn = load()[functionOf(op)] as MathFunction;
      return evaluateColumns(op, args, n, skip, (pairs) => {
        const [z, m] = pairs as [ComplexPair, ComplexPair | undefined];
        if (op === 'nthroot' && m) return fn(argument(z), m[0]);
        return fn(...pairs.map(argument));
      });
    },
    close: async () => undefined,
  };
}
