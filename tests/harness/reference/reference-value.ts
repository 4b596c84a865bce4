import { Decimal } from 'decimal.js';
import { BigComplex } from '../../../harness/reference/complex/big-complex';
import { principalValue } from '../../../harness/reference/principal-value';
import type { Convention } from '../../../shared/schemas/convention-schema';

Decimal.set({ precision: 60 });

/** A 40-digit reference value as decimal.js numbers, for identities checked to 35 digits. */
export function referenceValue(
  fn: string,
  x: number,
  y: number,
  convention: Convention = 'signed-zero',
  extra: {
    w?: { kind: 'rational'; value: import('../../../harness/reference/numbers/rational').Rational };
    n?: number;
  } = {},
): { re: Decimal; im: Decimal; double: [number, number] } {
  const r = principalValue({ fn, z: BigComplex.fromDoubles(x, y), convention, ...extra }, { double: true, digits: 40 });
  return {
    re: new Decimal(r.approximation.re.toDecimal(40)),
    im: new Decimal(r.approximation.im.toDecimal(40)),
    double: r.double,
  };
}
