import request from 'supertest';
import { signInAs } from '../../setup/sign-in-as';
import { startTestApp, type TestApp } from '../../setup/test-app';

describe('users routes', () => {
  let t: TestApp;
  let admin: request.Agent;
  const idOf = async (email: string): Promise<string> =>
    (await t.db.dataSource.query(`SELECT id FROM users WHERE email = $1`, [email]))[0].id;

  beforeAll(async () => {
    t = await startTestApp();
    admin = await signInAs(t.app, 'admin');
  });
  afterAll(() => t.stop());

  it('lists every user without password hashes', async () => {
    const res = await admin.get('/api/users');
    expect(res.status).toBe(200);
    expect(res.body.users.map((u: { email: string }) => u.email)).toEqual(
      expect.arrayContaining(['odile@sheetkeeper.test', 'mei@sheetkeeper.test']),
    );
    expect(JSON.stringify(res.body)).not.toMatch(/password|\$2[aby]\$/);
  });

  it('changes a role, and the user holds the new role at the next sign-in', async () => {
    const id = await idOf('mei@sheetkeeper.test');
    const res = await admin.patch(`/api/users/${id}`).send({ role: 'reviewer' });
    expect(res.status).toBe(200);
    expect(res.body.user.role).toBe('reviewer');
    const mei = request.agent(t.app);
    await mei.post('/api/auth/sign-in').send({ email: 'mei@sheetkeeper.test', password: 'mei-demo-2026' });
    expect((await mei.get('/api/me')).body.user.role).toBe('reviewer');
    expect((await mei.get('/api/users')).status).toBe(403);
  });

  it('applies a role change to a session that is already open', async () => {
    const id = await idOf('ravi@sheetkeeper.test');
    const ravi = await signInAs(t.app, 'contributor');
    expect((await ravi.get('/api/users')).status).toBe(403);
    await admin.patch(`/api/users/${id}`).send({ role: 'admin' });
    expect((await ravi.get('/api/users')).status).toBe(200);
    await admin.patch(`/api/users/${id}`).send({ role: 'contributor' });
    expect((await ravi.get('/api/users')).status).toBe(403);
  });

  it('refuses a malformed id with the field and rule', async () => {
    const res = await admin.patch('/api/users/not-a-uuid').send({ role: 'admin' });
    expect(res.status).toBe(400);
    expect(res.body.issues).toEqual([{ field: 'params.id', rule: 'must be a UUID' }]);
  });

  it('refuses an unknown role with the field and rule', async () => {
    const res = await admin.patch(`/api/users/${await idOf('ravi@sheetkeeper.test')}`).send({ role: 'owner' });
    expect(res.status).toBe(400);
    expect(res.body.issues).toEqual([
      { field: 'body.role', rule: 'must be one of admin, maintainer, reviewer, contributor' },
    ]);
  });

  it('answers 404 for a user that does not exist', async () => {
    const res = await admin.patch('/api/users/00000000-0000-4000-8000-000000000000').send({ role: 'reviewer' });
    expect(res.status).toBe(404);
  });

  it('refuses to demote the last admin', async () => {
    const res = await admin.patch(`/api/users/${await idOf('odile@sheetkeeper.test')}`).send({ role: 'maintainer' });
    expect(res.status).toBe(409);
    expect(res.body.kind).toBe('conflict');
    expect((await admin.get('/api/me')).body.user.role).toBe('admin');
  });

  describe('deactivation', () => {
    const signIn = (email: string, password: string) =>
      request(t.app).post('/api/auth/sign-in').send({ email, password });

    it("ends the person's sessions and refuses their API tokens at once, and their sign-in says why only to the password's holder", async () => {
      const hanneId = await idOf('hanne@sheetkeeper.test');
      const hanne = await signInAs(t.app, 'reviewer');
      const secret = (await hanne.post('/api/tokens').send({ name: 'review bot' })).body.secret as string;
      expect((await request(t.app).get('/api/me').set('Authorization', `Bearer ${secret}`)).status).toBe(200);

      const res = await admin.post(`/api/users/${hanneId}/deactivate`);
      expect(res.status).toBe(200);
      expect(res.body.user.deactivatedAt).toEqual(expect.any(String));
      expect((await hanne.get('/api/me')).status).toBe(401);
      const byToken = await request(t.app).get('/api/me').set('Authorization', `Bearer ${secret}`);
      expect(byToken.status).toBe(401);
      expect(byToken.body.message).toMatch(/deactivated/);

      const right = await signIn('hanne@sheetkeeper.test', 'hanne-demo-2026');
      expect(right.status).toBe(403);
      expect(right.body).toEqual({
        kind: 'deactivated',
        message:
          'This account is deactivated, so it cannot sign in. Ask an admin of your Sheetkeeper to reactivate it.',
      });
      const wrong = await signIn('hanne@sheetkeeper.test', 'a guess');
      expect(wrong.status).toBe(401);
      expect(wrong.body.kind).toBe('wrong-credentials');

      const back = await admin.post(`/api/users/${hanneId}/reactivate`);
      expect(back.body.user.deactivatedAt).toBeNull();
      expect((await signIn('hanne@sheetkeeper.test', 'hanne-demo-2026')).status).toBe(200);
      expect((await request(t.app).get('/api/me').set('Authorization', `Bearer ${secret}`)).status).toBe(200);
    });

    it('refuses to let an admin deactivate themselves', async () => {
      const res = await admin.post(`/api/users/${await idOf('odile@sheetkeeper.test')}/deactivate`);
      expect(res.status).toBe(409);
      expect(res.body.message).toMatch(/cannot deactivate your own account/);
      expect((await admin.get('/api/me')).status).toBe(200);
    });

    it('counts only active admins as the last admin', async () => {
      const kwameId = await idOf('kwame@sheetkeeper.test');
      const odileId = await idOf('odile@sheetkeeper.test');
      expect((await admin.patch(`/api/users/${kwameId}`).send({ role: 'admin' })).status).toBe(200);
      expect((await admin.post(`/api/users/${kwameId}/deactivate`)).status).toBe(200);
      const demote = await admin.patch(`/api/users/${odileId}`).send({ role: 'maintainer' });
      expect(demote.status).toBe(409);
      expect(demote.body.message).toBe('This is the last active admin; make someone else admin first.');
      // Kwame, admin again once reactivated, may deactivate Odile; Odile may not deactivate the last one.
      expect((await admin.post(`/api/users/${kwameId}/reactivate`)).status).toBe(200);
      const kwameAgent = request.agent(t.app);
      await kwameAgent.post('/api/auth/sign-in').send({ email: 'kwame@sheetkeeper.test', password: 'kwame-demo-2026' });
      expect((await kwameAgent.post(`/api/users/${odileId}/deactivate`)).status).toBe(200);
      expect((await admin.get('/api/me')).status).toBe(401);
      expect((await kwameAgent.post(`/api/users/${odileId}/reactivate`)).status).toBe(200);
      expect((await kwameAgent.patch(`/api/users/${kwameId}`).send({ role: 'maintainer' })).status).toBe(200);
      admin = await signInAs(t.app, 'admin');
    });

    it('refuses to deactivate the last active admin even when two admins try at once', async () => {
      const odileId = await idOf('odile@sheetkeeper.test');
      const raviId = await idOf('ravi@sheetkeeper.test');
      expect((await admin.patch(`/api/users/${raviId}`).send({ role: 'admin' })).status).toBe(200);
      const raviAgent = request.agent(t.app);
      await raviAgent.post('/api/auth/sign-in').send({ email: 'ravi@sheetkeeper.test', password: 'ravi-demo-2026' });
      const [a, b] = await Promise.all([
        admin.post(`/api/users/${raviId}/deactivate`),
        raviAgent.post(`/api/users/${odileId}/deactivate`),
      ]);
      // One of them goes first; the other is then signed out (401) or refused as the last admin (409).
      expect([a.status, b.status].filter((s) => s === 200)).toHaveLength(1);
      const active = await t.db.dataSource.query(
        `SELECT email FROM users WHERE role = 'admin' AND deactivated_at IS NULL`,
      );
      expect(active).toHaveLength(1);
      await t.db.dataSource.query(`UPDATE users SET deactivated_at = NULL`);
      await t.db.dataSource.query(`UPDATE users SET role = 'contributor' WHERE id = $1`, [raviId]);
    });

    it('answers 404 for an unknown user and names a malformed id', async () => {
      expect((await admin.post('/api/users/00000000-0000-4000-8000-000000000000/deactivate')).status).toBe(404);
      const bad = await admin.post('/api/users/nope/reactivate');
      expect(bad.status).toBe(400);
      expect(bad.body.issues).toEqual([{ field: 'params.id', rule: 'must be a UUID' }]);
    });
  });
});
