import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** A message as the local fake SMTP server received it: what the Outbox screen shows. */
@Entity({ name: 'received_mail' })
@Index('received_mail_received_at_idx', ['receivedAt'])
export class ReceivedMail {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'text', name: 'message_id', nullable: true })
  messageId!: string | null;

  @Column({ type: 'text', name: 'envelope_from' })
  envelopeFrom!: string;

  @Column({ type: 'text', name: 'envelope_to', array: true })
  envelopeTo!: string[];

  @Column({ type: 'text' })
  subject!: string;

  @Column({ type: 'text', name: 'text_body' })
  textBody!: string;

  @Column({ type: 'text', name: 'html_body', nullable: true })
  htmlBody!: string | null;

  @Column({ type: 'text' })
  raw!: string;

  @Column({ type: 'timestamptz', name: 'received_at', default: () => 'now()' })
  receivedAt!: Date;
}
