import { z } from 'zod';
import { RUN_STATUSES, RUN_TRIGGERS } from '../run-status';
import { queryObject } from './query-object';

/**
 * Query of `GET /api/runs`: newest first, filtered by plan, status and trigger, `limit` per page;
 * `before` is the last run id of the previous page (pages are keyed, never offset).
 */
export const runListQuery = queryObject({
  plan: z.uuid({ error: 'must be a plan id' }).optional(),
  status: z.enum(RUN_STATUSES, { error: `must be one of ${RUN_STATUSES.join(', ')}` }).optional(),
  trigger: z.enum(RUN_TRIGGERS, { error: `must be one of ${RUN_TRIGGERS.join(', ')}` }).optional(),
  limit: z.coerce
    .number({ error: 'must be a whole number' })
    .int({ error: 'must be a whole number' })
    .min(1, { error: 'must be at least 1' })
    .max(200, { error: 'must be at most 200' })
    .default(50),
  before: z.uuid({ error: 'must be a run id from a previous page' }).optional(),
});

export type RunListQuery = z.infer<typeof runListQuery>;
