import { Decimal } from 'decimal.js';
import { BigFloat } from '../../../harness/reference/numbers/big-float';

/** The exact value of a double as a decimal.js number (`new Decimal(x)` reads x's shortest decimal, not its value). */
export function exactDecimal(x: number): Decimal {
  return new Decimal(BigFloat.fromDouble(x).toDecimal(800));
}
