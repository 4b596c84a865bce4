import type { PropertyOutcome } from './property-outcome';

/** One property check of a run (`GET /api/runs/:id/properties`), with the pair it belongs to. */
export interface RunPropertyRow {
  suite: string;
  target: string;
  outcome: PropertyOutcome;
}
