import { z } from 'zod';
import { textSchema } from './text-schema';
import { jsonObject } from './json-object';

/** Body of a review: approve, or request changes with a comment saying what to change. */
export const reviewBody = jsonObject({
  decision: z.enum(['approve', 'request-changes'], { error: 'must be approve or request-changes' }),
  comment: textSchema('must be text').trim().max(4000, { error: 'must be at most 4000 characters' }).default(''),
}).refine((r) => r.decision === 'approve' || r.comment.length > 0, {
  error: 'is required when requesting changes',
  path: ['comment'],
});

export type ReviewBody = z.infer<typeof reviewBody>;
