/** A complex number on the wire (docs/suite-format.md). */
type Wire = { re: string; im: string };

const minus = (s: string) => s.replace(/^-/, '−');

/**
 * A wire complex number as a person reads it, "−0.5 − 0i", with true minus signs and the signed
 * zeros kept: on a cut the sign of a zero part is the whole point. A dash when there is none.
 */
export function wireNumber(c: Wire | null | undefined): string {
  if (!c) return '—';
  const negIm = c.im.startsWith('-');
  return `${minus(c.re)} ${negIm ? '−' : '+'} ${c.im.replace(/^-/, '')}i`;
}
