import type { z } from 'zod';
import type { tokenViewSchema } from './token-view-schema';

/** An API token as its owner sees it: never the secret, only its first characters. Declared by its schema (`token-view-schema.ts`). */
export type TokenView = z.infer<typeof tokenViewSchema>;
