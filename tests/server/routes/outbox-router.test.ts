import { signInAs } from '../../setup/sign-in-as';
import { startTestApp, type TestApp } from '../../setup/test-app';

describe('outbox routes', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
    for (let i = 0; i < 5; i += 1) {
      await t.db.dataSource.query(
        `INSERT INTO received_mail (envelope_from, envelope_to, subject, text_body, html_body, raw, received_at) VALUES ('sheetkeeper@localhost', '{kwame@sheetkeeper.test}', $1, 'text', '<p>html</p>', 'raw', now() - make_interval(mins => $2))`,
        [`mail ${i}`, 10 - i],
      );
    }
  });
  afterAll(() => t.stop());

  it('pages through received messages newest first', async () => {
    const admin = await signInAs(t.app, 'admin');
    const first = await admin.get('/api/outbox?limit=2');
    expect(first.body.messages.map((m: { subject: string }) => m.subject)).toEqual(['mail 4', 'mail 3']);
    const second = await admin.get(`/api/outbox?limit=2&before=${first.body.next}`);
    expect(second.body.messages.map((m: { subject: string }) => m.subject)).toEqual(['mail 2', 'mail 1']);
    const last = await admin.get(`/api/outbox?limit=2&before=${second.body.next}`);
    expect(last.body).toMatchObject({ messages: [{ subject: 'mail 0' }], next: null });
  });

  it('shows one message with its text and HTML parts', async () => {
    const admin = await signInAs(t.app, 'admin');
    const [{ id }] = (await admin.get('/api/outbox?limit=1')).body.messages;
    const res = await admin.get(`/api/outbox/${id}`);
    expect(res.body.message).toMatchObject({
      subject: 'mail 4',
      text: 'text',
      html: '<p>html</p>',
      to: ['kwame@sheetkeeper.test'],
    });
  });

  it('refuses a bad page size and an unknown message', async () => {
    const admin = await signInAs(t.app, 'admin');
    expect((await admin.get('/api/outbox?limit=0')).body.issues).toEqual([
      { field: 'query.limit', rule: 'must be at least 1' },
    ]);
    expect((await admin.get('/api/outbox/00000000-0000-4000-8000-000000000000')).status).toBe(404);
  });
});
