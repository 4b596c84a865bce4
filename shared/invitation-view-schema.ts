import { z } from 'zod';
import { ROLES } from './roles';

/** An invitation that can still be used, as the users screen lists it. */
export const invitationViewSchema = z.object({
  /** What `POST /api/users/invitations/:id/cancel` names; not the link's token. */
  id: z.string(),
  email: z.string(),
  role: z.enum(ROLES),
  sentBy: z.string(),
  sentAt: z.string().meta({ description: 'ISO 8601.' }),
  expiresAt: z.string().meta({ description: 'ISO 8601.' }),
});
