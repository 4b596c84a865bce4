import { formatDouble } from '../reference/numbers/format-double';
import type { ComplexPair } from './complex-pair';

/** z written the way people write it for a parser: "-4-0i", "-0+2i", "0+0i" (the sign of a zero kept as text). */
export function complexString([re, im]: ComplexPair): string {
  const negative = im < 0 || Object.is(im, -0);
  return `${formatDouble(re)}${negative ? '-' : '+'}${formatDouble(Math.abs(im))}i`;
}
