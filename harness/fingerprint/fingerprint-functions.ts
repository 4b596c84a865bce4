import { CATALOGUE_ENTRIES } from '../catalogue/catalogue-entries';
import { catalogueCuts } from '../cuts/catalogue-cuts';
import type { FingerprintFunction } from './fingerprint-function';

/**
 * The functions a fingerprint looks at, computed from each catalogue entry's `fingerprint`
 * probes in the catalogue's order: every catalogue function with a cut (exp has none), and the
 * roots written as powers, because a library that gets √ right may still get pow(z, 1/2) wrong
 * on the same cut. Each probe gets the cuts of the operation it calls.
 */
export const FINGERPRINT_FUNCTIONS: readonly FingerprintFunction[] = CATALOGUE_ENTRIES.flatMap((entry) =>
  entry.fingerprint.map((probe) => ({ ...probe, cuts: catalogueCuts(probe.op) ?? [] })),
);
