import type { MigrationInterface, QueryRunner } from 'typeorm';

/** The queue of mail to send, and the store of the local fake SMTP server. */
export class MailOutboxAndReceivedMail1764710000000 implements MigrationInterface {
  name = 'MailOutboxAndReceivedMail1764710000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE outbox_mail (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        kind text NOT NULL,
        recipients text[] NOT NULL,
        subject text NOT NULL,
        text_body text NOT NULL,
        html_body text NOT NULL,
        status text NOT NULL DEFAULT 'pending',
        attempts integer NOT NULL DEFAULT 0,
        next_attempt_at timestamptz NOT NULL DEFAULT now(),
        last_error text,
        sent_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT outbox_mail_status_known CHECK (status IN ('pending', 'sent'))
      )`);
    await q.query(`CREATE INDEX outbox_mail_due_idx ON outbox_mail (status, next_attempt_at)`);
    await q.query(`
      CREATE TABLE received_mail (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        message_id text,
        envelope_from text NOT NULL,
        envelope_to text[] NOT NULL,
        subject text NOT NULL,
        text_body text NOT NULL,
        html_body text,
        raw text NOT NULL,
        received_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE INDEX received_mail_received_at_idx ON received_mail (received_at)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE received_mail`);
    await q.query(`DROP TABLE outbox_mail`);
  }
}
