import type { Diagnosis } from '../../shared/diagnosis';
import type { WireComplex } from '../../shared/wire-complex';

/** One regression as the mail lists it. */
export interface RegressionRow {
  id: string;
  suiteSlug: string;
  targetName: string;
  pathName: string;
  z: WireComplex;
  zHex: WireComplex;
  expected: WireComplex | null;
  actual: WireComplex | null;
  diagnosis: Diagnosis | null;
  rule: string;
  reproducer: string;
}
