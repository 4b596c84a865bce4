/**
 * Where a queued mail stands. `pending` waits for its next attempt; `sending` is handed to the
 * relay now; `sent` was accepted; `unconfirmed` was handed over in full but the relay never
 * confirmed it (it may have arrived, so it is not sent again); `failed` was refused or could not
 * be handed over within the capped number of attempts.
 */
export const OUTBOX_MAIL_STATUSES = ['pending', 'sending', 'sent', 'unconfirmed', 'failed'] as const;

export type OutboxMailStatus = (typeof OUTBOX_MAIL_STATUSES)[number];
