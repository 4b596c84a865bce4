import type { ComplexPair } from './complex-pair';
import { entryBuilders } from './entry-builders';
import { evaluateColumns } from './evaluate-columns';
import { evaluateEach } from './evaluate-each';
import { OP_ARITY } from './op-arity';
import { mathjsEntries } from './mathjs-entries';
import { mathjsEntryWays } from './mathjs-entry-ways';
import type { Target } from './target';

type MathFunction = (...args: unknown[]) => unknown;
type MathInstance = Record<string, unknown> & Parameters<typeof mathjsEntryWays>[0];

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
 * mathjs at one installed version, in its own instance `create(all, { predictable })`. `alias` is
 * the package name, its npm alias or a package folder's absolute path (a configured target, whose
 * `identity` gives the name before the entry and the settings that say where it comes from).
 *
 * Every argument is built through the entry asked for (mathjs-entries.ts) and never patched
 * afterwards; `entry` (the end of the target's name) is the default. Entry `complex`:
 * `math.complex(re, im)`. Entry `number`: the plain number re, the way real-line code calls
 * mathjs; it cannot carry the sign of a zero imaginary part, which is the point of testing it:
 * `sqrt(-4)` is 2i with predictable off and NaN with predictable on (a suite's point with an
 * imaginary part, or a −0 one under signed-zero, is not applicable to it). An earlier step's
 * value goes to the next step as mathjs returned it (a number or a Complex), as user code would
 * pass it. nthroot's degree always goes in as a number. Loaded with `require` on first use:
 * `require('mathjs')` costs about a second (docs/conventions.md).
 */
export function mathjsTarget(
  alias: string,
  version: string,
  entry: 'complex' | 'number',
  predictable: boolean,
  complexJsVersion: string,
  identity?: { base: string; settings: Target['settings'] },
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
  const name = `${identity?.base ?? `mathjs@${version}`}/${entry}${predictable ? '/predictable' : ''}`;
  const entries = mathjsEntries(entry);
  const builder = entryBuilders({ name, entries }, () => mathjsEntryWays(load()));
  return {
    name,
    library: 'mathjs',
    version,
    settings: { ...(identity?.settings ?? { package: alias }), entry, predictable, 'complex.js': complexJsVersion },
    entries,
    supports: async (op) => has(op),
    evaluate: async (op, calls, entryName) => {
      if (!has(op)) return calls.map(() => ({ error: `mathjs ${version} has no ${functionOf(op)}` }));
      const fn = load()[functionOf(op)] as MathFunction;
      const build = builder(entryName);
      return evaluateEach(op, calls, (args) => {
        const [z, n] = args as [ComplexPair, ComplexPair | undefined];
        if (op === 'nthroot' && n) return fn(build(z), n[0]);
        return fn(...args.map(build));
      });
    },
    evaluateColumns: async (op, args, n, skip, entryName, keepValues) => {
      const build = builder(entryName);
      if (!has(op))
        return evaluateColumns(op, args, n, skip, build, () => {
          throw new Error(`mathjs ${version} has no ${functionOf(op)}`);
        });
      const fn = load()[functionOf(op)] as MathFunction;
      return evaluateColumns(
        op,
        args,
        n,
        skip,
        build,
        (values, pairs) => (op === 'nthroot' ? fn(values[0], (pairs[1] as ComplexPair)[0]) : fn(...values)),
        keepValues,
      );
    },
    close: async () => undefined,
  };
}
