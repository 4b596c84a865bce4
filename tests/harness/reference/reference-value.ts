import Decimal from 'decimal.js';
import { BigComplex } from '../../../harness/reference/complex/big-complex';
import { BigFloat } from '../../../harness/reference/numbers/big-float';
import { principalValue } from '../../../harness/reference/principal-value';
import type { Convention } from '../../../shared/schemas/convention-schema';

Decimal.set({ precision: 60 });

/** A 40-digit reference value as decimal.js numbers, for identities checked to 35 digits. */
export function referenceValue(
  fn: string,
  x: number,
  y: number,
  convention: Convention = 'signed-zero',
  extra: { w?: { kind: 'rational'; value: import('../../../harness/reference/numbers/rational').Rational }; n?: number } = {},
): { re: Decimal; im: Decimal; double: [number, number] } {
  const r = principalValue({ fn, z: BigComplex.fromDoubles(x, y), convention, ...extra }, { double: true, digits: 40 });
  return { re: new Decimal(r.approximation.re.toDecimal(40)), im: new Decimal(r.approximation.im.toDecimal(40)), double: r.double };
}

/** The exact value of a double as a decimal.js number (`new Decimal(x)` reads x's shortest decimal, not its value). */
export function exactDecimal(x: number): Decimal {
  return new Decimal(BigFloat.fromDouble(x).toDecimal(800));
}

/** |a − b| ≤ 10^−digits · max(1, |b|). */
export function close(a: Decimal, b: Decimal, digits = 35): boolean {
  return a.minus(b).abs().lte(Decimal.max(1, b.abs()).times(new Decimal(10).pow(-digits)));
}
