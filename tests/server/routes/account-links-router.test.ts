import { createHash } from 'node:crypto';
import request from 'supertest';
import { signInAs } from '../../setup/sign-in-as';
import { startTestApp, type TestApp } from '../../setup/test-app';

/** The one-time links of issue 15 (point 10): invitations and password resets, mailed through the outbox. */
describe('one-time links', () => {
  let t: TestApp;
  let admin: request.Agent;
  const sql = <T = Record<string, unknown>>(text: string, params: unknown[] = []): Promise<T[]> =>
    t.db.dataSource.query(text, params);
  /** The token in the newest mail queued to `email` (the only place it exists in the clear). */
  const tokenMailedTo = async (email: string): Promise<string> => {
    const [mail] = await sql<{ text_body: string }>(
      `SELECT text_body FROM outbox_mail WHERE $1 = ANY(recipients) ORDER BY created_at DESC, id DESC LIMIT 1`,
      [email],
    );
    const token = /skl_[A-Za-z0-9_-]{43}/.exec(mail?.text_body ?? '')?.[0];
    if (!token) throw new Error(`no link mailed to ${email}`);
    return token;
  };
  const invite = async (email: string, role = 'reviewer') => {
    const res = await admin.post('/api/users/invitations').send({ email, role });
    expect(res.status).toBe(201);
    return tokenMailedTo(email);
  };
  const use = (token: string, extra: Record<string, string> = {}) =>
    request(t.app)
      .post('/api/account-links/use')
      .send({ token, password: 'a long new password', displayName: 'New Person', ...extra });
  const idOf = async (email: string) =>
    (await sql<{ id: string }>(`SELECT id FROM users WHERE email = $1`, [email]))[0]!.id;

  beforeAll(async () => {
    t = await startTestApp({ appUrl: 'http://127.0.0.1:8460' });
    admin = await signInAs(t.app, 'admin');
  });
  afterAll(() => t.stop());

  it('mails an invitation whose link makes the account with the role and signs the person in, once', async () => {
    const token = await invite('ines@example.test', 'maintainer');
    const [mail] = await sql<{ subject: string; text_body: string; kind: string }>(
      `SELECT subject, text_body, kind FROM outbox_mail WHERE 'ines@example.test' = ANY(recipients)`,
    );
    expect(mail!.kind).toBe('invitation');
    expect(mail!.subject).toBe('Odile Marchetti (odile@sheetkeeper.test) invites you to Sheetkeeper');
    expect(mail!.text_body).toContain(`http://127.0.0.1:8460/join?token=${token}`);
    const looked = await request(t.app).post('/api/account-links/lookup').send({ token });
    expect(looked.status).toBe(200);
    expect(looked.body.link).toMatchObject({ kind: 'invitation', email: 'ines@example.test', role: 'maintainer' });

    const ines = request.agent(t.app);
    const used = await ines
      .post('/api/account-links/use')
      .send({ token, password: 'ines-chose-this', displayName: 'Inès Arbeloa' });
    expect(used.status).toBe(200);
    expect(used.body.user).toMatchObject({
      email: 'ines@example.test',
      role: 'maintainer',
      displayName: 'Inès Arbeloa',
    });
    expect((await ines.get('/api/me')).body.user.email).toBe('ines@example.test');
    const signIn = await request(t.app)
      .post('/api/auth/sign-in')
      .send({ email: 'ines@example.test', password: 'ines-chose-this' });
    expect(signIn.status).toBe(200);

    const again = await use(token);
    expect(again.status).toBe(410);
    expect(again.body.kind).toBe('link-unusable');
    expect(again.body.message).toMatch(/^This invitation was used on \d{4}-\d\d-\d\d: .*ask Odile Marchetti/);
  });

  it('stores only the hash of a token, never the token', async () => {
    const token = await invite('hash-only@example.test');
    const rows = await sql(`SELECT * FROM account_links WHERE email = 'hash-only@example.test'`);
    expect(rows).toHaveLength(1);
    expect(JSON.stringify(rows)).not.toContain(token);
    expect(JSON.stringify(rows)).not.toContain(token.slice(4, 20));
    expect(rows[0]!.token_hash).toBe(createHash('sha256').update(token).digest('hex'));
  });

  it('lets a newer invitation to the same address replace the older one', async () => {
    const first = await invite('twice@example.test');
    const second = await invite('twice@example.test', 'contributor');
    const old = await use(first);
    expect(old.status).toBe(410);
    expect(old.body.message).toMatch(/replaced by a newer one/);
    const fresh = await use(second);
    expect(fresh.status).toBe(200);
    expect(fresh.body.user.role).toBe('contributor');
  });

  it('refuses an expired link and says whom to ask', async () => {
    const token = await invite('late@example.test');
    await sql(`UPDATE account_links SET expires_at = now() - interval '1 second' WHERE email = 'late@example.test'`);
    const res = await request(t.app).post('/api/account-links/lookup').send({ token });
    expect(res.status).toBe(410);
    expect(res.body.message).toMatch(
      /^This invitation expired on \d{4}-\d\d-\d\d: ask Odile Marchetti \(odile@sheetkeeper\.test\)/,
    );
    expect((await use(token)).status).toBe(410);
    expect(await sql(`SELECT 1 FROM users WHERE email = 'late@example.test'`)).toEqual([]);
  });

  it('spends a link once when two people use it at the same moment', async () => {
    const token = await invite('race@example.test');
    const answers = await Promise.all([use(token), use(token), use(token)]);
    expect(answers.map((a) => a.status).sort()).toEqual([200, 410, 410]);
    expect(await sql(`SELECT 1 FROM users WHERE email = 'race@example.test'`)).toHaveLength(1);
  });

  it('refuses an invitation whose address got an account in the meantime, and makes no second one', async () => {
    const token = await invite('meantime@example.test');
    await sql(
      `INSERT INTO users (email, display_name, password_hash, role) VALUES ('meantime@example.test', 'Early', 'x', 'reviewer')`,
    );
    const res = await use(token);
    expect(res.status).toBe(409);
    expect(res.body.message).toBe('meantime@example.test has an account already: sign in with it instead.');
    expect(await sql(`SELECT display_name FROM users WHERE email = 'meantime@example.test'`)).toEqual([
      { display_name: 'Early' },
    ]);
  });

  it('refuses to invite an address that has an account', async () => {
    const res = await admin.post('/api/users/invitations').send({ email: 'Ravi@Sheetkeeper.test', role: 'admin' });
    expect(res.status).toBe(409);
    expect(res.body.message).toMatch(/ravi@sheetkeeper\.test has an account already \(Ravi Dutta\)/);
    expect(await sql(`SELECT 1 FROM account_links WHERE email = 'ravi@sheetkeeper.test'`)).toEqual([]);
  });

  it('names the field of a bad invitation, a short password and a missing name', async () => {
    const bad = await admin.post('/api/users/invitations').send({ email: 'not an address', role: 'owner' });
    expect(bad.status).toBe(400);
    expect(bad.body.issues.map((i: { field: string }) => i.field).sort()).toEqual(['body.email', 'body.role']);
    const token = await invite('fields@example.test');
    const short = await use(token, { password: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.issues).toEqual([{ field: 'body.password', rule: 'must be at least 12 characters' }]);
    const nameless = await request(t.app)
      .post('/api/account-links/use')
      .send({ token, password: 'a long new password' });
    expect(nameless.status).toBe(400);
    expect(nameless.body.issues).toEqual([{ field: 'body.displayName', rule: 'is required for an invitation' }]);
    // Neither refusal spent the link.
    expect((await use(token)).status).toBe(200);
  });

  it('mails a password reset whose link sets the password and ends the other sessions', async () => {
    const meiId = await idOf('mei@sheetkeeper.test');
    const signedInMei = async () => {
      const agent = request.agent(t.app);
      await agent.post('/api/auth/sign-in').send({ email: 'mei@sheetkeeper.test', password: 'mei-demo-2026' });
      return agent;
    };
    const phone = await signedInMei();
    const laptop = await signedInMei();
    const res = await admin.post(`/api/users/${meiId}/password-reset`);
    expect(res.status).toBe(201);
    expect(res.body.reset.email).toBe('mei@sheetkeeper.test');
    const token = await tokenMailedTo('mei@sheetkeeper.test');
    // The old password and sessions work until the link is used.
    expect((await phone.get('/api/me')).status).toBe(200);
    const looked = await request(t.app).post('/api/account-links/lookup').send({ token });
    expect(looked.body.link).toMatchObject({ kind: 'password-reset', displayName: 'Mei Okonkwo', role: 'contributor' });

    const browser = request.agent(t.app);
    const used = await browser.post('/api/account-links/use').send({ token, password: 'mei-new-password-1' });
    expect(used.status).toBe(200);
    expect((await browser.get('/api/me')).body.user.email).toBe('mei@sheetkeeper.test');
    expect((await phone.get('/api/me')).status).toBe(401);
    expect((await laptop.get('/api/me')).status).toBe(401);
    const signIn = (password: string) =>
      request(t.app).post('/api/auth/sign-in').send({ email: 'mei@sheetkeeper.test', password });
    expect((await signIn('mei-demo-2026')).status).toBe(401);
    expect((await signIn('mei-new-password-1')).status).toBe(200);
    expect((await use(token, { password: 'yet another password' })).status).toBe(410);
  });

  it('voids a reset link when its account is deactivated, and sends none to a deactivated account', async () => {
    const raviId = await idOf('ravi@sheetkeeper.test');
    expect((await admin.post(`/api/users/${raviId}/password-reset`)).status).toBe(201);
    const token = await tokenMailedTo('ravi@sheetkeeper.test');
    expect((await admin.post(`/api/users/${raviId}/deactivate`)).status).toBe(200);
    const res = await use(token);
    expect(res.status).toBe(410);
    expect(res.body.message).toMatch(/This account is deactivated/);
    const refused = await admin.post(`/api/users/${raviId}/password-reset`);
    expect(refused.status).toBe(409);
    expect(refused.body.message).toMatch(/deactivated; reactivate it before sending a reset/);
    expect((await admin.post(`/api/users/${raviId}/reactivate`)).status).toBe(200);
  });

  it('counts unknown tokens like failed sign-ins: the 11th from one client waits', async () => {
    const unknown = (i: number) => `skl_${String(i).padStart(43, 'x')}`;
    for (let i = 0; i < 10; i += 1) {
      const res = await request(t.app)
        .post('/api/account-links/lookup')
        .send({ token: unknown(i) });
      expect(res.status).toBe(410);
      expect(res.body.message).toMatch(/not one Sheetkeeper sent/);
    }
    const locked = await request(t.app)
      .post('/api/account-links/use')
      .send({
        token: unknown(11),
        password: 'a long new password',
      });
    expect(locked.status).toBe(429);
    expect(Number(locked.headers['retry-after'])).toBeGreaterThan(0);
  });

  it('lists only the invitations that can still be used, newest first', async () => {
    const res = await admin.get('/api/users/invitations');
    expect(res.status).toBe(200);
    const emails = res.body.invitations.map((i: { email: string }) => i.email);
    // Used (ines, twice, race, fields), expired (late), made an account meanwhile (meantime: still unused, so listed).
    expect(emails).toEqual(['meantime@example.test', 'hash-only@example.test']);
    expect(res.body.invitations[1]).toEqual({
      email: 'hash-only@example.test',
      role: 'reviewer',
      sentBy: 'Odile Marchetti (odile@sheetkeeper.test)',
      sentAt: expect.any(String),
      expiresAt: expect.any(String),
    });
  });
});
