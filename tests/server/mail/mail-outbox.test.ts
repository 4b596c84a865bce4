import { ReceivedMail } from '../../../server/entities/received-mail';
import { OutboxMail } from '../../../server/entities/outbox-mail';
import { backoffSeconds } from '../../../server/mail/backoff-seconds';
import { FakeSmtpServer } from '../../../server/mail/fake-smtp-server';
import { MailOutbox } from '../../../server/mail/mail-outbox';
import { createTestDatabase, type TestDatabase } from '../../setup/test-database';

const MAIL = {
  kind: 'regression',
  recipients: ['kwame@sheetkeeper.test'],
  subject: 'sqrt regressed',
  text: 'sqrt(−4 − 0i) now gives +2i',
  html: '<p>sqrt(−4 − 0i) now gives <b>+2i</b></p>',
};

describe('the mail outbox and the local SMTP server', () => {
  let db: TestDatabase;
  let smtp: FakeSmtpServer;
  let port: number;
  let outbox: MailOutbox;
  const received = () => db.dataSource.getRepository(ReceivedMail).find({ order: { receivedAt: 'ASC' } });

  beforeAll(async () => {
    db = await createTestDatabase();
    smtp = new FakeSmtpServer(db.dataSource);
    port = await smtp.start(0);
    outbox = new MailOutbox(db.dataSource, { host: '127.0.0.1', port });
  });
  afterAll(async () => {
    outbox.close();
    await smtp.stop();
    await db.drop();
  });
  beforeEach(async () => {
    await db.dataSource.query('DELETE FROM outbox_mail; DELETE FROM received_mail');
  });

  it('delivers a queued mail once, with its text and HTML parts', async () => {
    await outbox.enqueue(MAIL);
    expect(await outbox.deliverDue()).toEqual({ sent: 1, failed: 0 });
    expect(await outbox.deliverDue()).toEqual({ sent: 0, failed: 0 });
    const [mail, ...rest] = await received();
    expect(rest).toHaveLength(0);
    expect(mail).toMatchObject({
      envelopeTo: ['kwame@sheetkeeper.test'],
      subject: 'sqrt regressed',
      textBody: 'sqrt(−4 − 0i) now gives +2i',
    });
    expect(mail!.htmlBody).toContain('<b>+2i</b>');
  });

  it('keeps a mail while the SMTP server is down and delivers it once when it is back', async () => {
    await smtp.stop();
    const id = await outbox.enqueue(MAIL);
    // A second on: the row's stamp has microseconds, a Date only milliseconds.
    const now = new Date(Date.now() + 1000);
    expect(await outbox.deliverDue(now)).toEqual({ sent: 0, failed: 1 });
    const waiting = await db.dataSource.getRepository(OutboxMail).findOneByOrFail({ id });
    expect(waiting).toMatchObject({ status: 'pending', attempts: 1 });
    expect(waiting.nextAttemptAt.getTime() - now.getTime()).toBe(backoffSeconds(1) * 1000);
    expect(waiting.lastError).toMatch(/ECONNREFUSED|connect/i);

    port = await smtp.start(port);
    // Not due yet: nothing is sent before the backoff has passed.
    expect(await outbox.deliverDue(now)).toEqual({ sent: 0, failed: 0 });
    expect(await outbox.deliverDue(new Date(now.getTime() + 16_000))).toEqual({ sent: 1, failed: 0 });
    expect(await outbox.deliverDue(new Date(now.getTime() + 3_600_000))).toEqual({ sent: 0, failed: 0 });
    expect(await received()).toHaveLength(1);
  });

  it('sends each mail once when two deliverers run at the same moment', async () => {
    for (let i = 0; i < 6; i += 1) await outbox.enqueue({ ...MAIL, subject: `mail ${i}` });
    const other = new MailOutbox(db.dataSource, { host: '127.0.0.1', port });
    const [a, b] = await Promise.all([outbox.deliverDue(), other.deliverDue()]);
    other.close();
    // Each mail is taken by exactly one deliverer; one that timed out on a loaded machine is retried below, not resent.
    expect(a.sent + b.sent + a.failed + b.failed).toBe(6);
    await outbox.deliverDue(new Date(Date.now() + 3_600_000));
    const subjects = (await received()).map((m) => m.subject).sort();
    expect(subjects).toEqual(['mail 0', 'mail 1', 'mail 2', 'mail 3', 'mail 4', 'mail 5']);
  });

  it('doubles the wait after each failure up to an hour', () => {
    expect([1, 2, 3, 4, 9, 20].map(backoffSeconds)).toEqual([15, 30, 60, 120, 3600, 3600]);
  });
});
