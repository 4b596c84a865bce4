import { z } from 'zod';
import { ACCOUNT_LINK_KINDS } from './account-link-kinds';
import { ROLES } from './roles';

/** What the join page learns from a usable one-time link before the person chooses a password. */
export const accountLinkViewSchema = z.object({
  kind: z.enum(ACCOUNT_LINK_KINDS),
  email: z.string(),
  /** The role an invitation gives, or the account's role for a reset. */
  role: z.enum(ROLES),
  /** The account's name for a reset; null for an invitation, whose person names themselves. */
  displayName: z.string().nullable(),
  /** Who sent the link, so the page can say whom to ask. */
  sentBy: z.string(),
  expiresAt: z.string().meta({ description: 'ISO 8601.' }),
});
