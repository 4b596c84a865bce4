import type { ComplexPair } from './complex-pair';
import { evaluateColumns } from './evaluate-columns';
import { evaluateEach } from './evaluate-each';
import { OP_ARITY } from './op-arity';
import type { Target } from './target';
import { withExactParts } from './with-exact-parts';

interface ComplexJsValue {
  re: number;
  im: number;
  [method: string]: unknown;
}
type ComplexJsClass = { new (re: number, im: number): ComplexJsValue; prototype: Record<string, unknown> };

/**
 * complex.js at one installed version (`alias` is the package name or its npm alias,
 * e.g. "complex.js-2.4.1"). The package is required on first use, not before.
 *
 * Arguments are built with `new Complex(re, im)` and then given their exact parts
 * (with-exact-parts.ts). An operation whose method the version lacks (every
 * version from 2.0.11 to 2.4.3 lacks cbrt and nthroot) is unsupported and answers
 * an error per call.
 */
export function complexJsTarget(alias: string, version: string): Target {
  let Complex: ComplexJsClass | undefined;
  const load = (): ComplexJsClass => {
    if (Complex) return Complex;
    // Required here, not imported: a run that never uses this target never loads it.
    // eslint-disable-next-line @typescript-eslint/no-require-imports -- a lazy load of a package chosen at run time
    const mod = require(alias) as ComplexJsClass & { default?: ComplexJsClass };
    Complex = mod.default ?? mod;
    return Complex;
  };
  // complex.js names its methods after the catalogue's operations (sqrt, acoth, add, neg, …).
  const has = (op: string): boolean => op in OP_ARITY && typeof load().prototype[op] === 'function';
  const make = (z: ComplexPair): ComplexJsValue => withExactParts(new (load())(z[0], z[1]), z);
  return {
    name: `complex.js@${version}`,
    library: 'complex.js',
    version,
    settings: { package: alias },
    supports: async (op) => has(op),
    evaluate: async (op, calls) => {
      if (!has(op)) return calls.map(() => ({ error: `complex.js ${version} has no ${op}` }));
      return evaluateEach(op, calls, (args) => {
        const [z, ...rest] = args.map(make) as [ComplexJsValue, ...ComplexJsValue[]];
        return (z[op] as (...a: ComplexJsValue[]) => unknown).apply(z, rest);
      });
    },
    evaluateColumns: async (op, args, n, skip) => {
      if (!has(op))
        return evaluateColumns(op, args, n, skip, () => {
          throw new Error(`complex.js ${version} has no ${op}`);
        });
      if (args.length === 1) {
        // One argument: no array per call.
        return evaluateColumns(op, args, n, skip, (pairs) => {
          const z = make(pairs[0] as ComplexPair);
          return (z[op] as () => unknown).call(z);
        });
      }
      return evaluateColumns(op, args, n, skip, (pairs) => {
        const [z, ...rest] = pairs.map(make) as [ComplexJsValue, ...ComplexJsValue[]];
        return (z[op] as (...a: ComplexJsValue[]) => unknown).apply(z, rest);
      });
    },
    close: async () => undefined,
  };
}
