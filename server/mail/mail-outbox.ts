import nodemailer, { type Transporter } from 'nodemailer';
import type { DataSource, EntityManager } from 'typeorm';
import { OutboxMail } from '../entities/outbox-mail';
import { backoffSeconds } from './backoff-seconds';
import type { NewMail } from './new-mail';

/**
 * Mail goes through the database: `enqueue` stores it (in the caller's transaction, so a
 * run's results and its regression mail commit together), `deliverDue` sends what is due.
 * Rows are taken with FOR UPDATE SKIP LOCKED, so several server processes never send the same
 * mail twice at once. Delivery is at least once: a crash after the SMTP server said OK but
 * before the row is marked sent would resend it — the window is one UPDATE.
 */
export class MailOutbox {
  private readonly transport: Transporter;

  constructor(
    private readonly dataSource: DataSource,
    smtp: { host: string; port: number },
    private readonly from = 'Sheetkeeper <sheetkeeper@localhost>',
  ) {
    this.transport = nodemailer.createTransport({
      host: smtp.host,
      port: smtp.port,
      secure: false,
      ignoreTLS: true,
      connectionTimeout: 5000,
      greetingTimeout: 5000,
      socketTimeout: 10000,
    });
  }

  async enqueue(mail: NewMail, tx: EntityManager = this.dataSource.manager): Promise<string> {
    if (mail.recipients.length === 0) throw new Error('a mail needs at least one recipient');
    const result = await tx.getRepository(OutboxMail).insert({
      kind: mail.kind,
      recipients: mail.recipients,
      subject: mail.subject,
      textBody: mail.text,
      htmlBody: mail.html,
    });
    return result.identifiers[0]!.id as string;
  }

  /**
   * Sends every pending mail whose time has come (at most `limit`); returns how many were sent
   * and how many failed. Without `at`, "now" is the database's clock, the one that stamped the
   * rows: a JavaScript Date has only milliseconds, and a mail queued in the same millisecond
   * looked not yet due.
   */
  async deliverDue(at?: Date, limit = 20): Promise<{ sent: number; failed: number }> {
    return this.dataSource.transaction(async (tx) => {
      const due = await tx
        .getRepository(OutboxMail)
        .createQueryBuilder('m')
        .where('m.status = :pending AND m.next_attempt_at <= coalesce(:at::timestamptz, clock_timestamp())', {
          pending: 'pending',
          at: at ?? null,
        })
        .orderBy('m.next_attempt_at', 'ASC')
        .limit(limit)
        .setLock('pessimistic_write')
        .setOnLocked('skip_locked')
        .getMany();
      let sent = 0;
      let failed = 0;
      for (const mail of due) {
        try {
          await this.transport.sendMail({
            from: this.from,
            to: mail.recipients,
            subject: mail.subject,
            text: mail.textBody,
            html: mail.htmlBody,
            messageId: `<${mail.id}@sheetkeeper.local>`,
          });
          await tx
            .getRepository(OutboxMail)
            .update(mail.id, { status: 'sent', sentAt: new Date(), attempts: mail.attempts + 1, lastError: null });
          sent += 1;
        } catch (err) {
          const attempts = mail.attempts + 1;
          await tx.query(
            `UPDATE outbox_mail SET attempts = $2, last_error = $3, next_attempt_at = coalesce($4::timestamptz, clock_timestamp()) + make_interval(secs => $5) WHERE id = $1`,
            [mail.id, attempts, err instanceof Error ? err.message : String(err), at ?? null, backoffSeconds(attempts)],
          );
          failed += 1;
        }
      }
      return { sent, failed };
    });
  }

  close(): void {
    this.transport.close();
  }
}
