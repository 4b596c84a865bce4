import type { TargetEntry } from '../../shared/target-entry';

/**
 * A target's entries in words for the library screens: each entry's name and how the value is
 * built, the default marked, and what an entry cannot carry (its points are not applicable there,
 * never failures). Targets recorded before entries, or no longer installed, list none: null.
 */
export function entryWords(entries: readonly TargetEntry[] | undefined): string | null {
  if (!entries || entries.length === 0) return null;
  return `Values go in through: ${entries
    .map((e) => {
      const lacks = [
        ...(e.carries.imaginaryPart ? [] : ['no imaginary part']),
        ...(e.carries.imaginaryPart && !e.carries.imaginaryZeroSign ? ['no −0 imaginary part'] : []),
        ...(e.carries.realZeroSign ? [] : ['no −0 real part']),
      ];
      return `${e.name} (${e.call}${e.default ? ', the default' : ''}${lacks.length ? `; ${lacks.join(', ')}` : ''})`;
    })
    .join(' · ')}`;
}
