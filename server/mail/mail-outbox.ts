import nodemailer, { type Transporter } from 'nodemailer';
import type { DataSource, EntityManager } from 'typeorm';
import { MAIL_MAX_ATTEMPTS } from '../../shared/mail-max-attempts';
import { OutboxMail } from '../entities/outbox-mail';
import { backoffSeconds } from './backoff-seconds';
import { enqueueMail } from './enqueue-mail';
import { SCRUB_LINK_TOKENS_SQL } from './scrub-link-tokens-sql';
import type { NewMail } from './new-mail';

/**
 * How long the relay may take to answer. RFC 5321 §4.5.3.2 lets a client wait up to 10 minutes
 * for the reply to the message's final dot; the 10 s used before counted a relay that answered
 * after 12 s as failed although it had the mail, and the mail was sent again (issue 11: 4 copies).
 */
const SOCKET_TIMEOUT_MS = 60_000;
/** A row left `sending` this long after its claim was cut off mid-send (the process died). */
const CUT_OFF_MARGIN_MS = 30_000;

export interface MailOutboxOptions {
  host: string;
  port: number;
  /** Tests shorten it to meet a slow relay in milliseconds. */
  socketTimeoutMs?: number;
  from?: string;
}

/**
 * Mail goes through the database: `enqueue` stores it (in the caller's transaction, so a run's
 * results and its regression mail commit together), `deliverDue` sends what is due. Delivery is
 * at most once: a row is marked `sending` (and its attempt counted) in its own committed UPDATE
 * before the relay is contacted, with FOR UPDATE SKIP LOCKED so two deliverers never take one
 * row. The relay refusing or being unreachable is safe to retry (with backoff, up to
 * MAIL_MAX_ATTEMPTS, then `failed`); a connection that timed out after it opened may have handed the
 * mail over, so it becomes `unconfirmed` and is not sent again, as does a row whose sender died
 * mid-send. Each mail keeps one Message-ID, so a relay or reader can also tell copies apart.
 */
export class MailOutbox {
  private readonly transport: Transporter;
  private readonly socketTimeoutMs: number;
  private readonly from: string;

  constructor(
    private readonly dataSource: DataSource,
    options: MailOutboxOptions,
  ) {
    this.socketTimeoutMs = options.socketTimeoutMs ?? SOCKET_TIMEOUT_MS;
    this.from = options.from ?? 'Sheetkeeper <sheetkeeper@localhost>';
    this.transport = nodemailer.createTransport({
      host: options.host,
      port: options.port,
      secure: false,
      ignoreTLS: true,
      connectionTimeout: 5000,
      greetingTimeout: 5000,
      socketTimeout: this.socketTimeoutMs,
    });
  }

  /** Queues a mail (`enqueueMail`); returns its id, or null when a mail with the same idempotency key is queued or sent already. */
  enqueue(mail: NewMail, tx: EntityManager = this.dataSource.manager): Promise<string | null> {
    return enqueueMail(tx, mail);
  }

  /**
   * Sends every pending mail whose time has come (at most `limit`); returns how many were sent
   * and how many failed. Without `at`, "now" is the database's clock, the one that stamped the
   * rows: a JavaScript Date has only milliseconds, and a mail queued in the same millisecond
   * looked not yet due.
   */
  async deliverDue(at?: Date, limit = 20): Promise<{ sent: number; failed: number }> {
    await this.dataSource.query(
      `UPDATE outbox_mail SET status = 'unconfirmed', last_error = $2, ${SCRUB_LINK_TOKENS_SQL}
        WHERE status = 'sending' AND claimed_at < clock_timestamp() - make_interval(secs => $1)`,
      [
        (this.socketTimeoutMs + CUT_OFF_MARGIN_MS) / 1000,
        'The sender stopped while handing this mail to the relay; it may have arrived, so it is not sent again.',
      ],
    );
    const [due]: [OutboxMail[], number] = await this.dataSource.query(
      `UPDATE outbox_mail SET status = 'sending', claimed_at = clock_timestamp(), attempts = attempts + 1
        WHERE id IN (SELECT id FROM outbox_mail
                      WHERE status = 'pending' AND next_attempt_at <= coalesce($1::timestamptz, clock_timestamp())
                      ORDER BY next_attempt_at LIMIT $2 FOR UPDATE SKIP LOCKED)
       RETURNING id::text, recipients, subject, text_body AS "textBody", html_body AS "htmlBody", attempts`,
      [at ?? null, limit],
    );
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
        await this.dataSource.query(
          `UPDATE outbox_mail SET status = 'sent', sent_at = clock_timestamp(), last_error = NULL, ${SCRUB_LINK_TOKENS_SQL}
            WHERE id = $1`,
          [mail.id],
        );
        sent += 1;
      } catch (err) {
        failed += 1;
        await this.recordFailure(mail, err, at);
      }
    }
    return { sent, failed };
  }

  private async recordFailure(mail: OutboxMail, err: unknown, at: Date | undefined): Promise<void> {
    const message = err instanceof Error ? err.message : String(err);
    const timeoutType = (err as { timeoutType?: string } | null)?.timeoutType;
    if (timeoutType === 'SOCKET_TIMEOUT') {
      await this.dataSource.query(
        `UPDATE outbox_mail SET status = 'unconfirmed', last_error = $2, ${SCRUB_LINK_TOKENS_SQL} WHERE id = $1`,
        [
          mail.id,
          `The relay did not answer within ${this.socketTimeoutMs / 1000} s after the connection opened; the mail may have arrived, so it is not sent again.`,
        ],
      );
      return;
    }
    if (mail.attempts >= MAIL_MAX_ATTEMPTS) {
      await this.dataSource.query(
        `UPDATE outbox_mail SET status = 'failed', last_error = $2, ${SCRUB_LINK_TOKENS_SQL} WHERE id = $1`,
        [mail.id, `Not delivered after ${mail.attempts} attempts; the last: ${message}`],
      );
      return;
    }
    await this.dataSource.query(
      `UPDATE outbox_mail SET status = 'pending', last_error = $2,
              next_attempt_at = coalesce($3::timestamptz, clock_timestamp()) + make_interval(secs => $4)
        WHERE id = $1`,
      [mail.id, message, at ?? null, backoffSeconds(mail.attempts)],
    );
  }

  close(): void {
    this.transport.close();
  }
}
