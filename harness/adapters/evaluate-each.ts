import type { CallResult } from './call-result';
import type { ComplexPair } from './complex-pair';
import { libraryValuePair } from './library-value-pair';
import { OP_ARITY } from './op-arity';

/**
 * Runs a batch in-process, call by call: a wrong argument count, a throw or a
 * result that is not a number becomes that call's error, so one bad point never
 * stops the batch.
 */
export function evaluateEach(op: string, calls: ComplexPair[][], call: (args: ComplexPair[]) => unknown): CallResult[] {
  const arity = OP_ARITY[op];
  return calls.map((args): CallResult => {
    if (arity === undefined) return { error: `unknown op ${op}` };
    if (args.length !== arity) return { error: `${op} takes ${arity} argument(s), got ${args.length}` };
    try {
      return { value: libraryValuePair(call(args)) };
    } catch (e) {
      return { error: e instanceof Error ? e.message : String(e) };
    }
  });
}
