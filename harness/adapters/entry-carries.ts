import type { TargetEntry } from '../../shared/target-entry';

/** What an entry can express (shared/target-entry.ts): a complex value in full, or a plain real number. */
export const ENTRY_CARRIES = {
  /** Two parts, each with its zero sign: two numbers, an object, an array, a string. */
  everything: { imaginaryPart: true, realZeroSign: true, imaginaryZeroSign: true },
  /** A plain number: its own zero sign, and no imaginary part of either sign. */
  realOnly: { imaginaryPart: false, realZeroSign: true, imaginaryZeroSign: false },
} as const satisfies Record<string, TargetEntry['carries']>;
