import type { CallResult } from '../../../harness/adapters/call-result';
import type { ComplexPair } from '../../../harness/adapters/complex-pair';
import type { Target } from '../../../harness/adapters/target';

/** A test target answering each call with `call` (a throw becomes that call's error), supporting exactly `ops`. */
export function functionTarget(
  name: string,
  ops: readonly string[],
  call: (op: string, args: ComplexPair[]) => ComplexPair,
): Target {
  return {
    name,
    library: name,
    version: '0',
    settings: {},
    supports: async (op) => ops.includes(op),
    evaluate: async (op, calls) =>
      calls.map((args): CallResult => {
        if (!ops.includes(op)) return { error: `${name} has no ${op}` };
        try {
          return { value: call(op, args) };
        } catch (e) {
          return { error: e instanceof Error ? e.message : String(e) };
        }
      }),
    close: async () => undefined,
  };
}
