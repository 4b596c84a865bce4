import { BigComplex } from '../../harness/reference/complex/big-complex';
import { principalValue } from '../../harness/reference/principal-value';
import type { Convention } from '../../shared/schemas/convention-schema';

/** Our correctly rounded double for fn at x + iy, for comparisons with outside sources. */
export function referenceDouble(
  fn: string,
  x: number,
  y: number,
  convention: Convention = 'signed-zero',
): [number, number] {
  return principalValue({ fn, z: BigComplex.fromDoubles(x, y), convention }, { double: true, digits: 0 }).double;
}
