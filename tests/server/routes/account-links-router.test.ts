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

  it('points to Reactivate when the invited address has a deactivated account', async () => {
    const meiId = await idOf('mei@sheetkeeper.test');
    expect((await admin.post(`/api/users/${meiId}/deactivate`)).status).toBe(200);
    const res = await admin.post('/api/users/invitations').send({ email: 'mei@sheetkeeper.test', role: 'reviewer' });
    expect((await admin.post(`/api/users/${meiId}/reactivate`)).status).toBe(200);
    expect(res.status).toBe(409);
    expect(res.body.message).toBe(
      'mei@sheetkeeper.test has an account already (Mei Okonkwo), deactivated: reactivate it in the list instead; their role and password come back with it.',
    );
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
      id: expect.any(String),
      email: 'hash-only@example.test',
      role: 'reviewer',
      sentBy: 'Odile Marchetti (odile@sheetkeeper.test)',
      sentAt: expect.any(String),
      expiresAt: expect.any(String),
    });
  });

  describe('withdrawing an invitation', () => {
    const DAY = String.raw`\d{4}-\d\d-\d\d`;
    /** The id the Users screen holds for the open invitation to `email`. */
    const openIdOf = async (email: string): Promise<string> => {
      const res = await admin.get('/api/users/invitations');
      const found = res.body.invitations.find((i: { email: string }) => i.email === email);
      if (!found) throw new Error(`no open invitation to ${email}`);
      return found.id;
    };
    const cancel = (id: string, caller: request.Agent | ReturnType<typeof request> = admin) =>
      caller.post(`/api/users/invitations/${id}/cancel`);
    const lookUp = (token: string) => request(t.app).post('/api/account-links/lookup').send({ token });
    // The limiter test above locked this client out of the link routes for 15 minutes.
    beforeAll(() => sql(`DELETE FROM sign_in_limits`));

    it('stops the link at once: the join page says it was withdrawn and whom to ask, and no account can be made', async () => {
      const token = await invite('withdrawn@example.test');
      expect((await lookUp(token)).status).toBe(200);
      const id = await openIdOf('withdrawn@example.test');
      const res = await cancel(id);
      expect(res.status).toBe(200);
      expect(res.body.invitation).toEqual({ id, email: 'withdrawn@example.test', cancelledAt: expect.any(String) });

      const looked = await lookUp(token);
      expect(looked.status).toBe(410);
      expect(looked.body).toEqual({
        kind: 'link-unusable',
        message: expect.stringMatching(
          new RegExp(
            `^This invitation was withdrawn on ${DAY}: ask Odile Marchetti \\(odile@sheetkeeper\\.test\\) for a new one\\.$`,
          ),
        ),
      });
      const used = await use(token);
      expect(used.status).toBe(410);
      expect(used.body.message).toBe(looked.body.message);
      expect(await sql(`SELECT 1 FROM users WHERE email = 'withdrawn@example.test'`)).toEqual([]);
      const open = (await admin.get('/api/users/invitations')).body.invitations.map((i: { email: string }) => i.email);
      expect(open).not.toContain('withdrawn@example.test');
    });

    it('answers a second withdrawal with the date of the first', async () => {
      await invite('withdrawn-twice@example.test');
      const id = await openIdOf('withdrawn-twice@example.test');
      const first = await cancel(id);
      const second = await cancel(id);
      expect(second.status).toBe(200);
      expect(second.body.invitation.cancelledAt).toBe(first.body.invitation.cancelledAt);
    });

    it('refuses to withdraw a used invitation (409) and leaves its account signed up', async () => {
      const token = await invite('joined-first@example.test');
      const id = await openIdOf('joined-first@example.test');
      expect((await use(token)).status).toBe(200);
      const res = await cancel(id);
      expect(res.status).toBe(409);
      expect(res.body.message).toMatch(
        new RegExp(`^The invitation to joined-first@example\\.test was used on ${DAY} and made an account; deactivate`),
      );
      expect(await sql(`SELECT deactivated_at FROM users WHERE email = 'joined-first@example.test'`)).toEqual([
        { deactivated_at: null },
      ]);
      expect(await sql(`SELECT cancelled_at FROM account_links WHERE id = $1`, [id])).toEqual([{ cancelled_at: null }]);
    });

    it('refuses a replaced or an expired invitation (409) with the reason', async () => {
      await invite('replaced-then@example.test');
      const older = await openIdOf('replaced-then@example.test');
      await invite('replaced-then@example.test');
      const replaced = await cancel(older);
      expect(replaced.status).toBe(409);
      expect(replaced.body.message).toMatch(/replaced by a newer one on .*; cancel the newer one instead\.$/);

      await invite('expired-then@example.test');
      const id = await openIdOf('expired-then@example.test');
      await sql(`UPDATE account_links SET expires_at = now() - interval '1 second' WHERE id = $1`, [id]);
      const expired = await cancel(id);
      expect(expired.status).toBe(409);
      expect(expired.body.message).toMatch(/expired on .*; its link no longer works, so there is nothing to cancel\.$/);
    });

    it("answers 404 for an id that is no invitation: unknown, or a password reset's", async () => {
      expect((await cancel('00000000-0000-4000-8000-000000000000')).status).toBe(404);
      const meiId = await idOf('mei@sheetkeeper.test');
      expect((await admin.post(`/api/users/${meiId}/password-reset`)).status).toBe(201);
      const [reset] = await sql<{ id: string }>(
        `SELECT id FROM account_links WHERE kind = 'password-reset' AND user_id = $1 ORDER BY created_at DESC LIMIT 1`,
        [meiId],
      );
      const res = await cancel(reset!.id);
      expect(res.status).toBe(404);
      expect(res.body).toEqual({ kind: 'not-found', message: 'No invitation with that id.' });
      const malformed = await cancel('not-a-uuid');
      expect(malformed.status).toBe(400);
      expect(malformed.body.issues).toEqual([{ field: 'params.id', rule: 'must be a UUID' }]);
    });

    it('lets only an admin withdraw (403 for the other roles, 401 signed out), and the link still works after a refusal', async () => {
      const token = await invite('kept@example.test');
      const id = await openIdOf('kept@example.test');
      for (const role of ['maintainer', 'reviewer', 'contributor'] as const) {
        const res = await cancel(id, await signInAs(t.app, role));
        expect({ role, status: res.status }).toEqual({ role, status: 403 });
      }
      expect((await cancel(id, request(t.app))).status).toBe(401);
      expect(await sql(`SELECT cancelled_at FROM account_links WHERE id = $1`, [id])).toEqual([{ cancelled_at: null }]);
      expect((await lookUp(token)).status).toBe(200);
    });

    it('keeps a withdrawn link withdrawn when a new invitation goes to the same address, which works', async () => {
      const withdrawn = await invite('second-chance@example.test', 'maintainer');
      await cancel(await openIdOf('second-chance@example.test'));
      const fresh = await invite('second-chance@example.test', 'contributor');
      expect((await lookUp(withdrawn)).body.message).toMatch(/^This invitation was withdrawn on /);
      const joined = await use(fresh);
      expect(joined.status).toBe(200);
      expect(joined.body.user.role).toBe('contributor');
    });

    it('either makes the account or withdraws the link when both happen at the same moment, never both', async () => {
      for (let i = 0; i < 5; i += 1) {
        const email = `race-withdraw-${i}@example.test`;
        const token = await invite(email);
        const id = await openIdOf(email);
        const [joined, withdrawn] = await Promise.all([use(token), cancel(id)]);
        const accounts = await sql(`SELECT 1 FROM users WHERE email = $1`, [email]);
        const outcome = { joined: joined.status, withdrawn: withdrawn.status, accounts: accounts.length };
        expect([
          { joined: 200, withdrawn: 409, accounts: 1 },
          { joined: 410, withdrawn: 200, accounts: 0 },
        ]).toContainEqual(outcome);
      }
    });
  });
});
