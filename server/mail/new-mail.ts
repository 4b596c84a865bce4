/** A mail to send: plain-text and HTML parts of the same content. */
export interface NewMail {
  kind: string;
  recipients: string[];
  subject: string;
  text: string;
  html: string;
  /** What this mail is the one copy of: a second mail with the same key is not queued (mail-outbox.ts). */
  idempotencyKey?: string;
}
