import type { Convention } from '../../shared/schemas/convention-schema';
import type { ComplexPair } from '../adapters/complex-pair';
import { BigComplex } from '../reference/complex/big-complex';
import { principalDouble } from '../reference/principal-double';
import { principalValue } from '../reference/principal-value';

/**
 * The reference engine's correctly rounded principal value of a catalogue operation called
 * the way a library is called: `pow` with the exponent as the complex double the library
 * received, `nthroot` with n as n + 0i, the rest with z alone.
 */
export function referenceValue(op: string, args: readonly ComplexPair[], convention: Convention): ComplexPair {
  const [z, w] = args as [ComplexPair, ComplexPair | undefined];
  if (op === 'pow' || op === 'cbrt' || op === 'nthroot') {
    if (op !== 'cbrt' && !w) throw new RangeError(`${op} takes a second argument`);
    const request = {
      fn: op,
      z: BigComplex.fromDoubles(z[0], z[1]),
      w: op === 'pow' ? { kind: 'complex' as const, value: BigComplex.fromDoubles(w![0], w![1]) } : undefined,
      n: op === 'nthroot' ? w![0] : undefined,
      convention,
    };
    return principalValue(request, { double: true, digits: 0 }).double;
  }
  return principalDouble(op, z[0], z[1], convention);
}
