import type { WireComplex } from '../shared/wire-complex';

/** A wire complex number as a person reads it, "−4 − 0i", with a true minus sign; a dash when there is none. */
export function formatComplex(c: WireComplex | null | undefined): string {
  if (!c) return '—';
  const re = c.re.replace(/^-/, '−');
  const negIm = c.im.startsWith('-');
  return `${re} ${negIm ? '−' : '+'} ${c.im.replace(/^-/, '')}i`;
}
