import type { Suite } from '../../shared/schemas/suite-schema';

/** One uploaded table for a reference-table thread (reference-table-worker.ts) to check against `suite`. */
export type ReferenceTableRequest = { id: number; suite: Suite; csv: string };
