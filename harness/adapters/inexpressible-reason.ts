import type { TargetEntry } from '../../shared/target-entry';

/**
 * Why an input cannot go in through an entry (the point is then not applicable to it, never a
 * failure), or null when it can. A nonzero imaginary part needs an entry that has one; a zero
 * part's sign matters only when the suite's convention tells −0 from +0 (`zeroSigns`: signed-zero,
 * for principal and regular branches alike), and then
 * −0 needs an entry that carries that sign. +0 is what an entry without an imaginary part means.
 */
export function inexpressibleReason(entry: TargetEntry, re: number, im: number, zeroSigns: boolean): string | null {
  const { carries } = entry;
  if (!carries.imaginaryPart && im !== 0) return `the ${entry.name} entry (${entry.call}) has no imaginary part`;
  if (zeroSigns && !carries.imaginaryZeroSign && Object.is(im, -0))
    return `the ${entry.name} entry (${entry.call}) cannot carry the −0 of the imaginary part`;
  if (zeroSigns && !carries.realZeroSign && Object.is(re, -0))
    return `the ${entry.name} entry (${entry.call}) cannot carry the −0 of the real part`;
  return null;
}
