import { Check, Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/**
 * A mail Sheetkeeper wants to send. It stays here until the SMTP server accepts it; a failed
 * attempt schedules the next one with backoff, so no mail is lost while the server is down.
 */
@Entity({ name: 'outbox_mail' })
@Index('outbox_mail_due_idx', ['status', 'nextAttemptAt'])
@Check('outbox_mail_status_known', "status IN ('pending', 'sent')")
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
  status!: 'pending' | 'sent';

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
