import { z } from 'zod';
import { textSchema } from './text-schema';
import { queryObject } from './query-object';
import { SUITE_STATUSES } from '../suite-status';

/** Query of `GET /api/suites`: filter by the latest version's status, search slug, title and subject. */
export const suiteListQuery = queryObject({
  status: z.enum(SUITE_STATUSES, { error: `must be one of ${SUITE_STATUSES.join(', ')}` }).optional(),
  q: textSchema().trim().max(100, { error: 'must be at most 100 characters' }).optional(),
});
