import { textSchema } from './text-schema';

/** The prefix of a one-time link's token, so a leaked one is recognisable in a log or a scan. */
export const LINK_TOKEN_PREFIX = 'skl_';

/** A token in text, as a regular expression both JavaScript and PostgreSQL read alike: the prefix and 32 random bytes in base64url (43 characters). */
export const LINK_TOKEN_PATTERN = `${LINK_TOKEN_PREFIX}[A-Za-z0-9_-]{43}`;

/** A one-time link's token as mailed. */
export const linkTokenSchema = textSchema('is required').regex(new RegExp(`^${LINK_TOKEN_PATTERN}$`), {
  error: 'must be the whole token from the link in the mail',
});
