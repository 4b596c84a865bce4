import type { Diagnosis } from '../../shared/diagnosis';
import type { DiagnosisClass } from '../../shared/diagnosis-class';
import type { StepValue } from '../../shared/run-result';
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
  /** Every label, the leading one first (one for rows stored before there were several). */
  labels: Diagnosis[];
  findingClass: DiagnosisClass | null;
  rule: string;
  reproducer: string;
  steps: StepValue[] | null;
  firstLeftStep: number | null;
  /** Where conventions disagree, the rule that makes the expected value. */
  choice: string | null;
  /** The regressions of its suite × target pair in its class, listed or not: the mail orders its groups by it. */
  groupTotal: number;
}
