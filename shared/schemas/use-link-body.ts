import type { z } from 'zod';
import { displayNameSchema } from './display-name-schema';
import { jsonObject } from './json-object';
import { linkTokenSchema } from './link-token-schema';
import { newPasswordSchema } from './new-password-schema';

/**
 * Body of `POST /api/account-links/use`, and what the join page's form checks: the token, the
 * new password, and for an invitation the name the new account shows (the server asks for it
 * when the link is an invitation, naming `body.displayName`).
 */
export const useLinkBody = jsonObject({
  token: linkTokenSchema,
  password: newPasswordSchema,
  displayName: displayNameSchema.optional(),
});

export type UseLinkBody = z.infer<typeof useLinkBody>;
