import { z } from 'zod';
import { jsonObject } from './json-object';

/** Route parameters of the form `/:id`, where ids are UUIDs. */
export const idParams = jsonObject({ id: z.uuid({ error: 'must be a UUID' }) });
