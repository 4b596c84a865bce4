import { z } from 'zod';
import { textSchema } from './text-schema';
import { jsonObject } from './json-object';

/** Body of `POST /api/auth/sign-in`; the sign-in form validates with the same schema. */
export const signInBody = jsonObject({
  email: textSchema('is required')
    .trim()
    .toLowerCase()
    .min(1, { error: 'is required' })
    .max(254, { error: 'must be at most 254 characters' })
    .pipe(z.email({ error: 'must be an e-mail address' })),
  password: textSchema('is required')
    .min(1, { error: 'is required' })
    .max(200, { error: 'must be at most 200 characters' }),
});

export type SignInBody = z.infer<typeof signInBody>;
