import http from 'node:http';
import type { AddressInfo } from 'node:net';
import request from 'supertest';
import { DEMO_USERS } from '../../../server/seed/demo-users';
import type { Role } from '../../../shared/roles';
import { approvedSuite } from '../../setup/approved-suite';
import { startTestApp, type TestApp } from '../../setup/test-app';

/** Simultaneous requests per trial, spread over two sessions; the issue saw two runs in 10 of 10 trials with two. */
const AT_ONCE = 8;
const TRIALS = 5;

describe('Run now while a run of the plan is queued or running', () => {
  let t: TestApp;
  let server: http.Server;
  let base: string;
  const agents: request.Agent[] = [];

  const signIn = async (role: Role) => {
    const demo = DEMO_USERS.find((u) => u.role === role)!;
    const agent = request.agent(base);
    const res = await agent.post('/api/auth/sign-in').send({ email: demo.email, password: demo.password });
    expect(res.status).toBe(200);
    return agent;
  };
  const newPlan = async (name: string) => {
    const target = (
      await t.db.dataSource.query(`SELECT name FROM targets WHERE library = 'complex.js' AND installed LIMIT 1`)
    ).map((r: { name: string }) => r.name);
    const plan = await agents[0]!
      .post('/api/plans')
      .send({ name, recipients: [], suites: ['twice-sqrt'], targets: target });
    expect(plan.status).toBe(201);
    return plan.body.plan.id as string;
  };
  const activeRuns = async (planId: string) =>
    (
      await t.db.dataSource.query(
        `SELECT count(*)::int AS n FROM runs WHERE plan_id = $1 AND status IN ('queued', 'running')`,
        [planId],
      )
    )[0].n as number;

  beforeAll(async () => {
    t = await startTestApp();
    server = http.createServer(t.app);
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
    await approvedSuite(t.db.dataSource, 'twice-sqrt');
    agents.push(await signIn('maintainer'), await signIn('admin'));
  });
  afterAll(async () => {
    await new Promise((resolve) => server.close(resolve));
    await t.stop();
  });

  it('makes exactly one run when two sessions press it at the same moment, and answers the others with that run', async () => {
    for (let trial = 0; trial < TRIALS; trial += 1) {
      const planId = await newPlan(`twice plan ${trial}`);
      const answers = await Promise.all(
        Array.from({ length: AT_ONCE }, (_, i) => agents[i % 2]!.post('/api/runs').send({ planId })),
      );
      const ids = new Set(answers.map((a) => a.body.run.id));
      expect({ trial, runs: ids.size, stored: await activeRuns(planId) }).toEqual({ trial, runs: 1, stored: 1 });
      const fresh = answers.filter((a) => a.status === 202);
      expect(fresh.map((a) => a.body.existing)).toEqual([false]);
      expect(answers.filter((a) => a.status === 200).map((a) => a.body.existing)).toEqual(
        Array(AT_ONCE - 1).fill(true),
      );
    }
  });

  it('returns the queued run with existing: true, and starts a new one once that run is cancelled', async () => {
    const planId = await newPlan('twice plan again');
    const first = await agents[0]!.post('/api/runs').send({ planId });
    expect({ status: first.status, existing: first.body.existing }).toEqual({ status: 202, existing: false });
    const again = await agents[1]!.post('/api/runs').send({ planId });
    expect({ status: again.status, existing: again.body.existing, id: again.body.run.id }).toEqual({
      status: 200,
      existing: true,
      id: first.body.run.id,
    });
    expect((await agents[0]!.post(`/api/runs/${first.body.run.id}/cancel`)).status).toBe(200);
    const next = await agents[0]!.post('/api/runs').send({ planId });
    expect({ status: next.status, existing: next.body.existing }).toEqual({ status: 202, existing: false });
    expect(next.body.run.id).not.toBe(first.body.run.id);
  });

  it('refuses in the database a second queued run of a plan that bypasses the service', async () => {
    const planId = await newPlan('twice plan index');
    await agents[0]!.post('/api/runs').send({ planId });
    await expect(
      t.db.dataSource.query(
        `INSERT INTO runs (plan_id, plan_name, trigger, status, shards_total, shards_done, counts)
         VALUES ($1, 'x', 'manual', 'queued', 1, 0, '{"pass":0,"fail":0,"error":0,"skipped":0}')`,
        [planId],
      ),
    ).rejects.toThrow(/runs_one_active_per_plan/);
  });
});
