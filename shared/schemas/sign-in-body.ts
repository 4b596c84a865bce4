import type { z } from 'zod';
import { textSchema } from './text-schema';
import { jsonObject } from './json-object';
import { emailSchema } from './email-schema';
import { PASSWORD_MAX_LENGTH } from '../password-max-length';

/** Body of `POST /api/auth/sign-in`; the sign-in form validates with the same schema. */
export const signInBody = jsonObject({
  email: emailSchema,
  password: textSchema('is required')
    .min(1, { error: 'is required' })
    .max(PASSWORD_MAX_LENGTH, { error: `must be at most ${PASSWORD_MAX_LENGTH} characters` }),
});

export type SignInBody = z.infer<typeof signInBody>;
