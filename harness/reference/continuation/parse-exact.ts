import { parseNumber } from '../numbers/parse-number';
import type { Rational } from '../numbers/rational';

/** A wire number as an exact rational; "inf" and "nan" are refused with a RangeError naming the field. */
export function parseExact(text: string, field: string): Rational {
  const p = parseNumber(text);
  if (p.kind !== 'exact') throw new RangeError(`${field} must be finite`);
  return p.value;
}
