import type { z } from 'zod';
import { emailSchema } from './email-schema';
import { jsonObject } from './json-object';
import { roleSchema } from './role-schema';

/** Body of `POST /api/users/invitations`; the invitation form validates with the same schema. */
export const inviteBody = jsonObject({ email: emailSchema, role: roleSchema });

export type InviteBody = z.infer<typeof inviteBody>;
