import type { OutcomeCounts } from '../../../shared/run-result';

/** Outcome counts with nothing counted yet. */
export function emptyCounts(): OutcomeCounts {
  return { pass: 0, fail: 0, error: 0, skipped: 0, notApplicable: 0 };
}
