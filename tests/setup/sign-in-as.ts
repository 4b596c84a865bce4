import request from 'supertest';
import type { Express } from 'express';
import type { Server } from 'node:http';
import { DEMO_USERS } from '../../server/seed/demo-users';
import type { Role } from '../../shared/roles';

/** A supertest agent (on the app, or on a server already listening) signed in as the first demo user with `role` (its cookie jar keeps the session). */
export async function signInAs(app: Express | Server, role: Role) {
  const demo = DEMO_USERS.find((u) => u.role === role);
  if (!demo) throw new Error(`no demo user with role ${role}`);
  const agent = request.agent(app);
  const res = await agent.post('/api/auth/sign-in').send({ email: demo.email, password: demo.password });
  if (res.status !== 200) throw new Error(`sign-in as ${role} answered ${res.status}`);
  return agent;
}
