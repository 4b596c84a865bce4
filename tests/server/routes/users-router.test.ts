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
});
