import type { ReferenceFlag } from './reference-flag';
import type { WireComplex } from './wire-complex';

/**
 * One answer line of `sheetkeeper reference` (docs/suite-format.md, "The reference request"):
 * the exact principal value to `digits` significant digits, its correctly rounded double, the
 * IEEE 754 exceptions that rounding raised, or an error naming the field at fault.
 */
export type ReferenceAnswer =
  { value: WireComplex; double: WireComplex; flags?: ReferenceFlag[]; warning?: string } | { error: string };
