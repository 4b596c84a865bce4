import type { Convention } from '../../shared/schemas/convention-schema';
import { BigComplex } from './complex/big-complex';
import { fastPrincipal } from './fast/fast-principal';
import { principalValue } from './principal-value';

/**
 * The correctly rounded principal value of a one-argument catalogue function at the double
 * x + iy: the double-double tier when it can settle the rounding, else the bigint engine.
 * The fast tier only takes inputs with both parts non-zero, where the two conventions agree.
 */
export function principalDouble(fn: string, x: number, y: number, convention: Convention): [number, number] {
  return (
    fastPrincipal(fn, x, y) ??
    principalValue({ fn, z: BigComplex.fromDoubles(x, y), convention }, { double: true, digits: 0 }).double
  );
}
