import type { Diagnosis } from './diagnosis';

/**
 * The outcome of one point (docs/vocabulary.md), shared by harness, server and app. A failing
 * point carries every label that applies in `labels`, the leading one first (branch labels before
 * accuracy, diagnosis-class.ts); `diagnosis` is `labels[0]`, kept for readers of one label and for
 * rows stored before there were several (read them with outcome-labels.ts). `not-applicable`: the
 * target's entry cannot express the input (a −0 through plain numbers); counted apart, never a
 * failure.
 */
export type PointOutcome =
  | { kind: 'pass'; ulps: number; relativeError: number }
  | { kind: 'fail'; diagnosis: Diagnosis; labels?: Diagnosis[]; ulps: number; relativeError: number }
  | { kind: 'error'; message: string }
  | { kind: 'skipped'; reason: string }
  | { kind: 'not-applicable'; reason: string };
