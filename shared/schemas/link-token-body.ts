import type { z } from 'zod';
import { jsonObject } from './json-object';
import { linkTokenSchema } from './link-token-schema';

/** Body of `POST /api/account-links/lookup`: which link the page was opened with. */
export const linkTokenBody = jsonObject({ token: linkTokenSchema });

export type LinkTokenBody = z.infer<typeof linkTokenBody>;
