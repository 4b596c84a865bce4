import { z } from 'zod';
import { queryObject } from './query-object';

/** Query of `GET /api/outbox`: newest first, `limit` per page, `before` = the last id of the previous page. */
export const outboxListQuery = queryObject({
  limit: z.coerce
    .number({ error: 'must be a whole number' })
    .int({ error: 'must be a whole number' })
    .min(1, { error: 'must be at least 1' })
    .max(200, { error: 'must be at most 200' })
    .default(50),
  before: z.uuid({ error: 'must be a message id' }).optional(),
});
