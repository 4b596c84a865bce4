import { z } from 'zod';
import { queryObject } from './query-object';

/** The most completed runs one request of a plan's findings by kind may ask for. */
export const FINDINGS_BY_KIND_MAX_RUNS = 50;

/**
 * Query of `GET /api/plans/:id/findings-by-kind`: how many of the plan's latest completed runs
 * to count (`runs`, 1–50, 12 unless given). The app's picture sends it through this schema too.
 */
export const findingsByKindQuery = queryObject({
  runs: z.coerce
    .number({ error: 'must be a whole number' })
    .int({ error: 'must be a whole number' })
    .min(1, { error: 'must be at least 1' })
    .max(FINDINGS_BY_KIND_MAX_RUNS, { error: `must be at most ${FINDINGS_BY_KIND_MAX_RUNS}` })
    .default(12),
});

export type FindingsByKindQuery = z.infer<typeof findingsByKindQuery>;
