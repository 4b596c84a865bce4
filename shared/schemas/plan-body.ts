import { z } from 'zod';
import { textSchema } from './text-schema';
import { jsonObject } from './json-object';

const unique = (list: string[]) => new Set(list).size === list.length;

/** Body of creating or replacing a plan: suites × targets and who hears about regressions. */
export const planBody = jsonObject({
  name: textSchema('is required')
    .trim()
    .min(3, { error: 'must be at least 3 characters' })
    .max(80, { error: 'must be at most 80 characters' }),
  description: textSchema('must be text').max(2000, { error: 'must be at most 2000 characters' }).default(''),
  recipients: z
    .array(z.email({ error: 'must be an e-mail address' }), { error: 'must be a list of e-mail addresses' })
    .max(50, { error: 'must have at most 50 addresses' })
    .refine(unique, { error: 'must not repeat an address' }),
  suites: z
    .array(textSchema().regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, { error: 'must be a suite id' }), {
      error: 'must be a list of suite ids',
    })
    .min(1, { error: 'needs at least one suite' })
    .max(200, { error: 'must have at most 200 suites' })
    .refine(unique, { error: 'must not repeat a suite' }),
  targets: z
    .array(textSchema().min(1).max(120), { error: 'must be a list of target names' })
    .min(1, { error: 'needs at least one target' })
    .max(50, { error: 'must have at most 50 targets' })
    .refine(unique, { error: 'must not repeat a target' }),
});

export type PlanBody = z.infer<typeof planBody>;
