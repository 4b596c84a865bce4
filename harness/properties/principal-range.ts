import { CATALOGUE_ENTRIES } from '../catalogue/catalogue-entries';
import type { RangeCondition } from './range-condition';

/**
 * The principal ranges of the catalogue's functions, computed from each entry's `range`
 * (harness/catalogue/entries), closed (the signed-zero convention
 * reaches both edges, one from each side of the cut): DLMF §4.2(i) for log, §4.23(ii) for
 * the inverse trigonometric and §4.37(ii) for the inverse hyperbolic functions (the ranges
 * themselves are drawn in the DLMF's figures, not checked here; the reciprocal cousins share the range of the function they invert through
 * 1/z). `ccwOpenMin` is set where DLMF writes the range half-open (−π < Im log z ≤ π), which
 * is Kahan's counter-clockwise choice. Powers and roots have their own rule (powerRange).
 */
export const PRINCIPAL_RANGE: Readonly<Record<string, readonly RangeCondition[]>> = Object.fromEntries(
  CATALOGUE_ENTRIES.flatMap((entry) => (entry.range ? [[entry.name, entry.range]] : [])),
);
