import type { EntityManager } from 'typeorm';
import type { NewMail } from './new-mail';

/**
 * Queues a mail in `outbox_mail` through `tx` (so it commits with whatever it is about); the
 * delivery loop (`MailOutbox.deliverDue`) sends it. Returns its id, or null when a mail with the
 * same idempotency key is queued or sent already.
 */
export async function enqueueMail(tx: EntityManager, mail: NewMail): Promise<string | null> {
  if (mail.recipients.length === 0) throw new Error('a mail needs at least one recipient');
  const rows: { id: string }[] = await tx.query(
    `INSERT INTO outbox_mail (kind, recipients, subject, text_body, html_body, idempotency_key)
     VALUES ($1, $2, $3, $4, $5, $6) ON CONFLICT (idempotency_key) DO NOTHING RETURNING id::text`,
    [mail.kind, mail.recipients, mail.subject, mail.text, mail.html, mail.idempotencyKey ?? null],
  );
  return rows[0]?.id ?? null;
}
