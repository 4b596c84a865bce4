import type { WireComplex } from './wire-complex';

/**
 * U+2212 MINUS SIGN, the one minus of text for people: the app already wrote it, IBM Plex Sans
 * and Mono have it (tests/constants/font-coverage.test.ts reads their cmap tables), and unlike a
 * hyphen it cannot break a line between the sign and "0".
 */
const MINUS = '\u2212';

/** A part as written: its sign and the digits (or word) after it; "+2" and "2" read the same. */
const split = (part: string): { negative: boolean; magnitude: string } =>
  part.startsWith('-') || part.startsWith(MINUS)
    ? { negative: true, magnitude: part.slice(1) }
    : { negative: false, magnitude: part.startsWith('+') ? part.slice(1) : part };

/** A plain decimal takes "i" directly ("2i"); a word, ratio or hex float gets "·i" ("inf·i", "1/3·i"), not "infi". */
const PLAIN_DECIMAL = /^[0-9.]+(e[+-]?[0-9]+)?$/i;

/**
 * A wire complex number as text, "re ± im i", sign-exact: a negative zero keeps its sign
 * ("−0 − 0i"), every part carries exactly one sign, and infinities and NaN are spelled as on the
 * wire ("inf", "nan"), so the text reads back to the same two doubles. For text people read
 * (app, mail, CLI table) the minus is U+2212; `ascii: true` writes the signs and the "*i" of a
 * word as ASCII ("-" and "*"), for outputs that programs read (JUnit). A missing value is "—".
 */
export function formatComplexText(c: WireComplex | null | undefined, options: { ascii?: boolean } = {}): string {
  if (!c) return '—';
  const minus = options.ascii ? '-' : MINUS;
  const re = split(c.re);
  const im = split(c.im);
  const unit = PLAIN_DECIMAL.test(im.magnitude) ? 'i' : options.ascii ? '*i' : '·i';
  return `${re.negative ? minus : ''}${re.magnitude} ${im.negative ? minus : '+'} ${im.magnitude}${unit}`;
}
