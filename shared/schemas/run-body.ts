import { z } from 'zod';
import { jsonObject } from './json-object';

/** Body of `POST /api/runs`: the plan to run now. */
export const runBody = jsonObject({ planId: z.uuid({ error: 'must be a plan id' }) });
