import type { ComplexPair } from '../adapters/complex-pair';
import type { PlaneCut } from '../cuts/plane-cut';

/** A function as the fingerprint calls it: a label, the library operation, extra arguments after z, and its cuts. */
export interface FingerprintFunction {
  label: string;
  op: string;
  extra: ComplexPair[];
  cuts: PlaneCut[];
}
