import type { AccountLinkKind } from './account-link-kinds';

/**
 * How long a mailed link works. An invitation waits for someone who may be away for a week; a
 * reset opens an existing account, so it lives a day: long enough to read the mail, short
 * enough that an old mailbox's copy opens nothing.
 */
export const ACCOUNT_LINK_LIFETIME_HOURS: Record<AccountLinkKind, number> = {
  invitation: 7 * 24,
  'password-reset': 24,
};
