import type { ColumnArg, ColumnResult } from './column-args';
import type { ComplexPair } from './complex-pair';
import { OP_ARITY } from './op-arity';

/**
 * evaluateEach (evaluate-each.ts) column-wise for an in-process library: an argument column that
 * carries the library's own values (an earlier step's result) is passed as it is; any other
 * argument is built from its parts with `build` (the entry's way in, shared/target-entry.ts), a
 * constant once for the whole column. `call` gets the built arguments (and the parts, for a
 * library that takes one argument as a plain number) and returns the library's value, kept in
 * `values` when `keepValues` says a later step takes it (keeping 100,000 objects alive that no
 * step reads moves them out of the young generation for nothing); a wrong argument count, a throw or a result that is not a number or complex becomes
 * that point's error, exactly as in evaluateEach.
 */
export function evaluateColumns(
  op: string,
  args: ColumnArg[],
  n: number,
  skip: ReadonlyMap<number, string>,
  build: (z: ComplexPair) => unknown,
  call: (values: unknown[], pairs: ComplexPair[]) => unknown,
  keepValues = false,
): ColumnResult {
  const out: ColumnResult = { re: new Float64Array(n), im: new Float64Array(n), errors: new Map(skip) };
  const kept = keepValues ? new Array<unknown>(n) : null;
  if (kept) out.values = kept;
  const arity = OP_ARITY[op];
  const fail = (message: string) => {
    for (let i = 0; i < n; i++) if (!out.errors.has(i)) out.errors.set(i, message);
    return out;
  };
  if (arity === undefined) return fail(`unknown op ${op}`);
  if (args.length !== arity) return fail(`${op} takes ${arity} argument(s), got ${args.length}`);
  const pairs: ComplexPair[] = args.map(() => [0, 0]);
  const built: unknown[] = new Array<unknown>(args.length);
  // A constant is built once (per column, not per point); a failure to build it is every point's error.
  const constants: unknown[] = new Array<unknown>(args.length);
  for (let a = 0; a < args.length; a++) {
    const arg = args[a] as ColumnArg;
    if (!Array.isArray(arg)) continue;
    try {
      constants[a] = build(arg);
    } catch (e) {
      return fail(e instanceof Error ? e.message : String(e));
    }
  }
  const hasSkips = skip.size > 0;
  for (let i = 0; i < n; i++) {
    if (hasSkips && skip.has(i)) continue;
    try {
      for (let a = 0; a < args.length; a++) {
        const arg = args[a] as ColumnArg;
        const pair = pairs[a] as ComplexPair;
        if (Array.isArray(arg)) {
          pair[0] = arg[0];
          pair[1] = arg[1];
          built[a] = constants[a];
        } else {
          pair[0] = arg.re[i] as number;
          pair[1] = arg.im[i] as number;
          built[a] = arg.values ? arg.values[i] : build(pair);
        }
      }
      const v = call(built, pairs);
      if (typeof v === 'number') {
        out.re[i] = v;
        out.im[i] = 0;
        if (kept) kept[i] = v;
      } else if (
        typeof v === 'object' &&
        v !== null &&
        typeof (v as { re?: unknown }).re === 'number' &&
        typeof (v as { im?: unknown }).im === 'number'
      ) {
        out.re[i] = (v as { re: number }).re;
        out.im[i] = (v as { im: number }).im;
        if (kept) kept[i] = v;
      } else {
        out.errors.set(i, `result is not a number or complex: ${String(v)}`);
      }
    } catch (e) {
      out.errors.set(i, e instanceof Error ? e.message : String(e));
    }
  }
  return out;
}
