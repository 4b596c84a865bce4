import { z } from 'zod';
import { textSchema } from './text-schema';
import { jsonObject } from './json-object';
import { timeZoneSchema } from './time-zone-schema';

/** A cron expression (5 or 6 fields); the server checks each field and answers the next run times. */
export const cronSchema = textSchema('is required')
  .trim()
  .min(9, { error: 'must have 5 or 6 fields' })
  .max(100, { error: 'must be at most 100 characters' });

/** Body of creating a schedule. */
export const scheduleBody = jsonObject({
  planId: z.uuid({ error: 'must be a plan id' }),
  cron: cronSchema,
  timeZone: timeZoneSchema,
  enabled: z.boolean({ error: 'must be true or false' }).default(true),
});

/** Body of changing a schedule: any of cron, time zone and enabled. */
export const schedulePatchBody = jsonObject({
  cron: cronSchema.optional(),
  timeZone: timeZoneSchema.optional(),
  enabled: z.boolean({ error: 'must be true or false' }).optional(),
}).refine((p) => p.cron !== undefined || p.timeZone !== undefined || p.enabled !== undefined, {
  error: 'must change at least one of cron, timeZone, enabled',
});

/** Body of asking when a cron expression would fire. */
export const cronPreviewBody = jsonObject({ cron: cronSchema, timeZone: timeZoneSchema });
