import { z } from 'zod';

/** An API token as its owner sees it (never the secret, only its first characters); the OpenAPI document shows this schema. */
export const tokenViewSchema = z.object({
  id: z.string().meta({ description: 'A UUID.' }),
  name: z.string(),
  prefix: z.string().meta({ description: 'The first 10 characters of the secret, to tell tokens apart.' }),
  createdAt: z.string().meta({ description: 'ISO 8601.' }),
  lastUsedAt: z.string().nullable(),
  revokedAt: z.string().nullable(),
});
