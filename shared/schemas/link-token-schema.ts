import { textSchema } from './text-schema';

/** The prefix of a one-time link's token, so a leaked one is recognisable in a log or a scan. */
export const LINK_TOKEN_PREFIX = 'skl_';

/** A one-time link's token as mailed: the prefix and 32 random bytes in base64url (43 characters). */
export const linkTokenSchema = textSchema('is required').regex(/^skl_[A-Za-z0-9_-]{43}$/, {
  error: 'must be the whole token from the link in the mail',
});
