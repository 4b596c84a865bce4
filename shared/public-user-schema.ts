import { z } from 'zod';
import { ROLES } from './roles';

/** A user as the API shows it (never the password hash); the OpenAPI document shows this schema. */
export const publicUserSchema = z.object({
  id: z.string().meta({ description: 'A UUID.' }),
  email: z.string(),
  displayName: z.string(),
  role: z.enum(ROLES),
  createdAt: z.string().meta({ description: 'ISO 8601.' }),
  /** When an admin deactivated the account (it cannot sign in, its sessions and tokens are refused); null while active. */
  deactivatedAt: z.string().nullable().meta({ description: 'ISO 8601, or null while the account is active.' }),
});
