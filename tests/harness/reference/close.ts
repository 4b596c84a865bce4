import { Decimal } from 'decimal.js';

/** |a − b| ≤ 10^−digits · max(1, |b|). */
export function close(a: Decimal, b: Decimal, digits = 35): boolean {
  return a
    .minus(b)
    .abs()
    .lte(Decimal.max(1, b.abs()).times(new Decimal(10).pow(-digits)));
}
