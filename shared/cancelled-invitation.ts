import type { z } from 'zod';
import type { cancelledInvitationSchema } from './cancelled-invitation-schema';

/** A withdrawn invitation; declared by its schema (`cancelled-invitation-schema.ts`). */
export type CancelledInvitation = z.infer<typeof cancelledInvitationSchema>;
