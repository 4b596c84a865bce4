import request from 'supertest';
import { ROLES, type Role } from '../../../shared/roles';
import { signInAs } from '../../setup/sign-in-as';
import { startTestApp, type TestApp } from '../../setup/test-app';

type Who = 'signed-out' | Role;
const WHO: Who[] = ['signed-out', ...ROLES];

let t: TestApp;
let contributorId: string;

beforeAll(async () => {
  t = await startTestApp();
  const row = await t.db.dataSource.query(`SELECT id FROM users WHERE email = 'mei@sheetkeeper.test'`);
  contributorId = row[0].id;
});
afterAll(() => t.stop());

interface RouteCase {
  name: string;
  call: (agent: request.Agent | ReturnType<typeof request>) => request.Test;
  expect: Record<Who, number>;
}

/** Every API route, with the status each kind of caller must get. */
const ROUTES: RouteCase[] = [
  {
    name: 'POST /api/auth/sign-in',
    call: (a) => a.post('/api/auth/sign-in').send({ email: 'ravi@sheetkeeper.test', password: 'ravi-demo-2026' }),
    expect: { 'signed-out': 200, admin: 200, maintainer: 200, reviewer: 200, contributor: 200 },
  },
  { name: 'GET /api/me', call: (a) => a.get('/api/me'), expect: { 'signed-out': 401, admin: 200, maintainer: 200, reviewer: 200, contributor: 200 } },
  { name: 'GET /api/users', call: (a) => a.get('/api/users'), expect: { 'signed-out': 401, admin: 200, maintainer: 403, reviewer: 403, contributor: 403 } },
  {
    name: 'PATCH /api/users/:id',
    call: (a) => a.patch(`/api/users/${contributorId}`).send({ role: 'contributor' }),
    expect: { 'signed-out': 401, admin: 200, maintainer: 403, reviewer: 403, contributor: 403 },
  },
  { name: 'GET /api/unknown-route', call: (a) => a.get('/api/unknown-route'), expect: { 'signed-out': 404, admin: 404, maintainer: 404, reviewer: 404, contributor: 404 } },
  { name: 'POST /api/auth/sign-out', call: (a) => a.post('/api/auth/sign-out'), expect: { 'signed-out': 204, admin: 204, maintainer: 204, reviewer: 204, contributor: 204 } },
];

describe('route × caller table', () => {
  const cases = ROUTES.flatMap((route) => WHO.map((who) => [route.name, who, route.expect[who], route] as const));

  it.each(cases)('%s answers %s with %i', async (_name, who, status, route) => {
    const caller = who === 'signed-out' ? request(t.app) : await signInAs(t.app, who);
    const res = await route.call(caller);
    expect(res.status).toBe(status);
    if (status === 401) expect(res.body.kind).toBe('signed-out');
    if (status === 403) expect(res.body.kind).toBe('forbidden');
  });
});
