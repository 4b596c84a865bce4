import type { CallResult } from '../../../../harness/adapters/call-result';
import type { ComplexPair } from '../../../../harness/adapters/complex-pair';
import type { Target } from '../../../../harness/adapters/target';
import { BigComplex } from '../../../../harness/reference/complex/big-complex';
import { principalDouble } from '../../../../harness/reference/principal-double';
import { principalValue } from '../../../../harness/reference/principal-value';

type Pair = [number, number];
const ARITHMETIC: Record<string, (a: Pair, b: Pair) => Pair> = {
  add: (a, b) => [a[0] + b[0], a[1] + b[1]],
  sub: (a, b) => [a[0] - b[0], a[1] - b[1]],
  mul: (a, b) => [a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]],
  div: (a, b) => {
    const m = b[0] * b[0] + b[1] * b[1];
    return [(a[0] * b[0] + a[1] * b[1]) / m, (a[1] * b[0] - a[0] * b[1]) / m];
  },
};

/**
 * A perfect library for tests: every catalogue function answers the reference's correctly
 * rounded principal value under signed zeros (ISO C Annex G) or counter-clockwise continuity,
 * arithmetic is done in doubles;
 * `fault` may change any answer, to plant exactly one kind of failure.
 */
export function referenceTarget(
  name = 'oracle@1',
  fault?: (op: string, args: ComplexPair[], value: Pair) => Pair,
  convention: 'signed-zero' | 'counter-clockwise' = 'signed-zero',
): Target {
  const value = (op: string, args: ComplexPair[]): Pair => {
    const [z, w] = args as [Pair, Pair | undefined];
    if (op === 'neg') return [-z[0], -z[1]];
    const arith = ARITHMETIC[op];
    if (arith) return arith(z, w as Pair);
    if (op === 'pow')
      return principalValue(
        {
          fn: 'pow',
          z: BigComplex.fromDoubles(z[0], z[1]),
          w: { kind: 'complex', value: BigComplex.fromDoubles((w as Pair)[0], (w as Pair)[1]) },
          convention,
        },
        { double: true, digits: 0 },
      ).double;
    if (op === 'nthroot')
      return principalValue(
        { fn: 'nthroot', z: BigComplex.fromDoubles(z[0], z[1]), n: (w as Pair)[0], convention },
        { double: true, digits: 0 },
      ).double;
    return principalDouble(op, z[0], z[1], convention);
  };
  return {
    name,
    library: 'oracle',
    version: '1',
    settings: {},
    supports: async () => true,
    evaluate: async (op, calls) =>
      calls.map((args): CallResult => {
        try {
          const v = value(op, args);
          return { value: fault ? fault(op, args, v) : v };
        } catch (e) {
          return { error: e instanceof Error ? e.message : String(e) };
        }
      }),
    close: async () => undefined,
  };
}
