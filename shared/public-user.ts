import type { z } from 'zod';
import type { publicUserSchema } from './public-user-schema';

/** A user as the API shows it: never the password hash. Declared by its schema (`public-user-schema.ts`). */
export type PublicUser = z.infer<typeof publicUserSchema>;
