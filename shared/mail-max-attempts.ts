/** Delivery attempts before a mail is marked failed: with backoff-seconds.ts, the last is ~3.75 min after the first. */
export const MAIL_MAX_ATTEMPTS = 5;
