import { z } from 'zod';

/** An invitation an admin withdrew: its link no longer works. */
export const cancelledInvitationSchema = z.object({
  id: z.string(),
  email: z.string(),
  cancelledAt: z.string().meta({ description: 'ISO 8601: the first withdrawal, when it is asked again.' }),
});
