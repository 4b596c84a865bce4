import { complexJsEntryWays } from './complex-js-entry-ways';
import { COMPLEX_JS_ENTRIES } from './complex-js-entries';
import { entryBuilders } from './entry-builders';
import { evaluateColumns } from './evaluate-columns';
import { evaluateEach } from './evaluate-each';
import { OP_ARITY } from './op-arity';
import type { Target } from './target';

interface ComplexJsValue {
  re: number;
  im: number;
  [method: string]: unknown;
}
type ComplexJsClass = Parameters<typeof complexJsEntryWays>[0] & { prototype: Record<string, unknown> };

/**
 * complex.js at one installed version (`alias` is the package name or its npm alias,
 * e.g. "complex.js-2.4.1", or the absolute path of a package folder for a configured target,
 * docs/target-sources.md). The package is required on first use, not before. `identity` replaces
 * the name and settings of a configured target (its source, not an alias, names where it is).
 *
 * Arguments are built through the entry asked for (complex-js-entries.ts; `new Complex(re, im)`
 * by default) and never patched afterwards, so a constructor that drops a −0 (complex.js 2.4.1)
 * is seen as a user of that constructor sees it. An earlier step's value goes to the next
 * step as the library's own object. An operation whose method the version lacks (every
 * version from 2.0.11 to 2.4.3 lacks cbrt and nthroot) is unsupported and answers
 * an error per call.
 */
export function complexJsTarget(
  alias: string,
  version: string,
  identity?: { name: string; settings: Target['settings'] },
): Target {
  let Complex: ComplexJsClass | undefined;
  const load = (): ComplexJsClass => {
    if (Complex) return Complex;
    // Required here, not imported: a run that never uses this target never loads it.
    // eslint-disable-next-line @typescript-eslint/no-require-imports -- a lazy load of a package chosen at run time
    const mod = require(alias) as ComplexJsClass & { default?: ComplexJsClass };
    Complex = mod.default ?? mod;
    return Complex;
  };
  const name = identity?.name ?? `complex.js@${version}`;
  const builder = entryBuilders({ name, entries: [...COMPLEX_JS_ENTRIES] }, () => complexJsEntryWays(load()));
  // complex.js names its methods after the catalogue's operations (sqrt, acoth, add, neg, …).
  const has = (op: string): boolean => op in OP_ARITY && typeof load().prototype[op] === 'function';
  const apply = (op: string, values: unknown[]): unknown => {
    const [z, ...rest] = values as [ComplexJsValue, ...unknown[]];
    return (z[op] as (...a: unknown[]) => unknown).apply(z, rest);
  };
  return {
    name,
    library: 'complex.js',
    version,
    settings: identity?.settings ?? { package: alias },
    entries: [...COMPLEX_JS_ENTRIES],
    supports: async (op) => has(op),
    evaluate: async (op, calls, entry) => {
      if (!has(op)) return calls.map(() => ({ error: `complex.js ${version} has no ${op}` }));
      const build = builder(entry);
      return evaluateEach(op, calls, (args) => apply(op, args.map(build)));
    },
    evaluateColumns: async (op, args, n, skip, entry, keepValues) => {
      const build = builder(entry);
      if (!has(op))
        return evaluateColumns(op, args, n, skip, build, () => {
          throw new Error(`complex.js ${version} has no ${op}`);
        });
      if (args.length === 1) {
        // One argument: no array per call.
        return evaluateColumns(
          op,
          args,
          n,
          skip,
          build,
          (values) => {
            const z = values[0] as ComplexJsValue;
            return (z[op] as () => unknown).call(z);
          },
          keepValues,
        );
      }
      return evaluateColumns(op, args, n, skip, build, (values) => apply(op, values), keepValues);
    },
    close: async () => undefined,
  };
}
