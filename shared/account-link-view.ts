import type { z } from 'zod';
import type { accountLinkViewSchema } from './account-link-view-schema';

/** A usable one-time link as the join page shows it; declared by its schema (`account-link-view-schema.ts`). */
export type AccountLinkView = z.infer<typeof accountLinkViewSchema>;
