import { Rational } from '../reference/numbers/rational';
import { PI_MULTIPLE } from '../../shared/schemas/pi-multiple';

/**
 * An angle written as a rational multiple of π ("pi/2", "-3pi/4", "0.5*pi") as an exact number
 * of turns ("pi/2" is exactly 1/4), or null for an angle in radians, which no rational number of
 * turns can hold. parseTurns gives the same angle in doubles for building the path's points.
 */
export function exactTurns(angle: string, what = 'angle'): Rational | null {
  const m = PI_MULTIPLE.exec(angle.trim());
  if (!m) return null;
  const [, sign, multiplier, divisor] = m;
  const num = multiplier === undefined ? Rational.ONE : decimal(multiplier);
  const den = divisor === undefined ? 1n : BigInt(divisor);
  if (den === 0n) throw new RangeError(`${what}: "${angle}" divides by zero`);
  const turns = num.div(new Rational(2n * den));
  return sign === '-' ? turns.negate() : turns;
}

/** "12" or "0.25" exactly. */
function decimal(text: string): Rational {
  const [whole, fraction = ''] = text.split('.');
  return new Rational(BigInt(`${whole}${fraction}`), 10n ** BigInt(fraction.length));
}
