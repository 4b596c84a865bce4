import { failureNumberSchema } from './failure-number-schema';
import { jsonObject } from './json-object';

/** Route parameters `/:id` of a failure, whose ids are `bigint` numbers, not UUIDs. */
export const failureIdParams = jsonObject({ id: failureNumberSchema });
