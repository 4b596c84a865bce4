import type { PropertyCheck } from '../../shared/schemas/property-check-schema';
import { conjugateSymmetryLaw } from './conjugate-symmetry-law';
import { evenSymmetryLaw } from './even-symmetry-law';
import { expLogLaw } from './exp-log-law';
import { oddSymmetryLaw } from './odd-symmetry-law';
import type { PropertyLaw } from './property-law';
import { rangeLaw } from './range-law';
import { rootPowerLaw } from './root-power-law';
import { unwindingLaw } from './unwinding-law';

/** Every law a property check can name (shared/schemas/property-check-schema.ts), by name. */
export const PROPERTY_LAW_CHECKS: Readonly<Record<PropertyCheck['law'], PropertyLaw>> = {
  'conjugate-symmetry': conjugateSymmetryLaw,
  'odd-symmetry': oddSymmetryLaw,
  'even-symmetry': evenSymmetryLaw,
  'root-power': rootPowerLaw,
  'exp-log': expLogLaw,
  range: rangeLaw,
  unwinding: unwindingLaw,
};
