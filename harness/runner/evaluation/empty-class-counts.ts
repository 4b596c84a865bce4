import type { ClassCounts } from '../../../shared/run-result';

/** No failing point of either class (diagnosis-class.ts). */
export function emptyClassCounts(): ClassCounts {
  return { branch: 0, accuracy: 0 };
}
