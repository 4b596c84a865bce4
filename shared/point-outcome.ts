import type { Diagnosis } from './diagnosis';

/** The outcome of one point (docs/vocabulary.md), shared by harness, server and app. */
export type PointOutcome =
  | { kind: 'pass'; ulps: number; relativeError: number }
  | { kind: 'fail'; diagnosis: Diagnosis; ulps: number; relativeError: number }
  | { kind: 'error'; message: string }
  | { kind: 'skipped'; reason: string };
