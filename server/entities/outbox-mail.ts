import { Check, Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, Unique } from 'typeorm';
import { OUTBOX_MAIL_STATUSES, type OutboxMailStatus } from '../../shared/outbox-mail-status';

/**
 * A mail Sheetkeeper wants to send. It stays here until the SMTP server accepts it; a failed
 * attempt schedules the next one with backoff, so no mail is lost while the server is down.
 * What each status means is in shared/outbox-mail-status.ts; mail-outbox.ts moves between them.
 */
@Entity({ name: 'outbox_mail' })
@Index('outbox_mail_due_idx', ['status', 'nextAttemptAt'])
@Unique('outbox_mail_idempotency_key_unique', ['idempotencyKey'])
@Check('outbox_mail_status_known', `status IN (${OUTBOX_MAIL_STATUSES.map((s) => `'${s}'`).join(', ')})`)
export class OutboxMail {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  /** What the mail is about, e.g. "regression"; shown in the queue. */
  @Column({ type: 'text' })
  kind!: string;

  @Column({ type: 'text', array: true })
  recipients!: string[];

  @Column({ type: 'text' })
  subject!: string;

  @Column({ type: 'text', name: 'text_body' })
  textBody!: string;

  @Column({ type: 'text', name: 'html_body' })
  htmlBody!: string;

  @Column({ type: 'text', default: 'pending' })
  status!: OutboxMailStatus;

  /** What the mail is the one copy of (e.g. a run's regressions); a second mail with the same key is not queued. */
  @Column({ type: 'text', name: 'idempotency_key', nullable: true })
  idempotencyKey!: string | null;

  /** When a deliverer marked it `sending`; a row left `sending` long after this was cut off mid-send. */
  @Column({ type: 'timestamptz', name: 'claimed_at', nullable: true })
  claimedAt!: Date | null;

  @Column({ type: 'integer', default: 0 })
  attempts!: number;

  @Column({ type: 'timestamptz', name: 'next_attempt_at', default: () => 'now()' })
  nextAttemptAt!: Date;

  @Column({ type: 'text', name: 'last_error', nullable: true })
  lastError!: string | null;

  @Column({ type: 'timestamptz', name: 'sent_at', nullable: true })
  sentAt!: Date | null;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt!: Date;
}
