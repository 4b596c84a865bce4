import type { OutboxMailStatus } from './outbox-mail-status';

/** A mail Sheetkeeper has queued but the relay has not (or not surely) accepted, as the Outbox lists it. */
export interface OutboxMailView {
  id: string;
  kind: string;
  subject: string;
  recipients: string[];
  status: OutboxMailStatus;
  attempts: number;
  lastError: string | null;
  nextAttemptAt: string;
  createdAt: string;
}
