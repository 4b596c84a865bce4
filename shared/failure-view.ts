import type { Diagnosis } from './diagnosis';
import type { WireComplex } from './wire-complex';

/**
 * A row of the failure table (GET /api/failures). `rule`, `reproducer` and `limits` come only
 * with one failure (GET /api/failures/:id) and in the CSV.
 */
export interface FailureView {
  id: string;
  runId: string;
  suiteSlug: string;
  suiteVersion: number;
  targetName: string;
  convention: string;
  pathName: string;
  pointIndex: number;
  t: number;
  label: string | null;
  z: WireComplex;
  /** The input's exact bits as C99 hex floats. */
  zHex: WireComplex;
  expected: WireComplex | null;
  actual: WireComplex | null;
  outcomeKind: 'fail' | 'error' | 'skipped';
  diagnosis: Diagnosis | null;
  ulps: number | null;
  relativeError: number | null;
  rule?: string;
  reproducer?: string;
  /** For a point on a cut: the limits from both sides, named. */
  limits?: { sides: [string, string]; values: [WireComplex, WireComplex] } | null;
  /** This point passed in the previous completed run of the plan. */
  isRegression: boolean;
}
