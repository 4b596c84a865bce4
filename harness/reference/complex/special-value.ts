import { BigFloat } from '../numbers/big-float';
import { FixedTables } from '../real/fixed-tables';
import { Approximation } from './approximation';

/** A part of a special value: an exact BigFloat (zeros, infinities, NaN) or q·π/4. */
export type SpecialPart = BigFloat | { quarterPi: number };

/**
 * A result fixed by a special-value rule (ISO/IEC 9899:2011 G.6) rather than computed:
 * each part is an IEEE special, a signed zero, or a multiple of π/4.
 *
 * The tables in the function files restate G.6 in our own words, not copied from the text (see
 * docs/sources.md for the subclauses read);
 * every row is checked against Python's cmath in tests/external/cmath-annex-g.test.ts, and the
 * rows cmath refuses against the C rule stated there.
 */
export class SpecialValue {
  constructor(
    readonly re: SpecialPart,
    readonly im: SpecialPart,
  ) {}

  static part(p: SpecialPart | number): SpecialPart {
    return typeof p === 'number' ? { quarterPi: p } : p;
  }

  static of(re: SpecialPart | number, im: SpecialPart | number): SpecialValue {
    return new SpecialValue(SpecialValue.part(re), SpecialValue.part(im));
  }

  conj(): SpecialValue {
    return new SpecialValue(this.re, negatePart(this.im));
  }

  negate(): SpecialValue {
    return new SpecialValue(negatePart(this.re), negatePart(this.im));
  }

  /** −i·(a + bi) = b − ai. */
  mulMinusI(): SpecialValue {
    return new SpecialValue(this.im, negatePart(this.re));
  }

  toApproximation(bits: number): Approximation {
    const [re, reErr] = realize(this.re, bits);
    const [im, imErr] = realize(this.im, bits);
    return new Approximation(re, im, reErr, imErr);
  }
}

function negatePart(p: SpecialPart): SpecialPart {
  return p instanceof BigFloat ? p.negate() : { quarterPi: -p.quarterPi };
}

function realize(p: SpecialPart, bits: number): [BigFloat, number] {
  if (p instanceof BigFloat) return [p, -Infinity];
  const F = bits + 8;
  const value = BigFloat.fromBigInt(BigInt(p.quarterPi) * FixedTables.pi(F), -F - 2);
  return [value, value.exponent() - bits];
}
