import type { z } from 'zod';
import type { invitationViewSchema } from './invitation-view-schema';

/** An open invitation; declared by its schema (`invitation-view-schema.ts`). */
export type InvitationView = z.infer<typeof invitationViewSchema>;
