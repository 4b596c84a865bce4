import type { ColumnArg, ColumnResult } from './column-args';
import type { ComplexPair } from './complex-pair';
import { OP_ARITY } from './op-arity';

/**
 * evaluateEach (evaluate-each.ts) column-wise: `call` gets the arguments of one point as the
 * parts it needs and returns the library's value; a wrong argument count, a throw or a result
 * that is not a number or complex becomes that point's error, exactly as in evaluateEach.
 */
export function evaluateColumns(
  op: string,
  args: ColumnArg[],
  n: number,
  skip: ReadonlyMap<number, string>,
  call: (args: ComplexPair[]) => unknown,
): ColumnResult {
  const out: ColumnResult = { re: new Float64Array(n), im: new Float64Array(n), errors: new Map(skip) };
  const arity = OP_ARITY[op];
  const fail = (message: string) => {
    for (let i = 0; i < n; i++) if (!out.errors.has(i)) out.errors.set(i, message);
    return out;
  };
  if (arity === undefined) return fail(`unknown op ${op}`);
  if (args.length !== arity) return fail(`${op} takes ${arity} argument(s), got ${args.length}`);
  const pairs: ComplexPair[] = args.map(() => [0, 0]);
  const hasSkips = skip.size > 0;
  for (let i = 0; i < n; i++) {
    if (hasSkips && skip.has(i)) continue;
    for (let a = 0; a < args.length; a++) {
      const arg = args[a] as ColumnArg;
      const pair = pairs[a] as ComplexPair;
      if (Array.isArray(arg)) {
        pair[0] = arg[0];
        pair[1] = arg[1];
      } else {
        pair[0] = (arg as { re: Float64Array }).re[i] as number;
        pair[1] = (arg as { im: Float64Array }).im[i] as number;
      }
    }
    try {
      const v = call(pairs);
      if (typeof v === 'number') {
        out.re[i] = v;
        out.im[i] = 0;
      } else if (
        typeof v === 'object' &&
        v !== null &&
        typeof (v as { re?: unknown }).re === 'number' &&
        typeof (v as { im?: unknown }).im === 'number'
      ) {
        out.re[i] = (v as { re: number }).re;
        out.im[i] = (v as { im: number }).im;
      } else {
        out.errors.set(i, `result is not a number or complex: ${String(v)}`);
      }
    } catch (e) {
      out.errors.set(i, e instanceof Error ? e.message : String(e));
    }
  }
  return out;
}
