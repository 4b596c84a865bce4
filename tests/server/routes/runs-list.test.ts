import type request from 'supertest';
import type { RunView } from '../../../shared/run-view';
import { approvedSuite } from '../../setup/approved-suite';
import { signInAs } from '../../setup/sign-in-as';
import { startTestApp, type TestApp } from '../../setup/test-app';

describe('GET /api/runs filters and pages', () => {
  let t: TestApp;
  let kwame: request.Agent;
  let nightly: string;
  let release: string;
  /** Run ids by plan, oldest first. */
  const started: Record<string, string[]> = {};

  const list = async (query: string): Promise<{ runs: RunView[]; next: string | null }> => {
    const res = await kwame.get(`/api/runs${query}`);
    expect(res.status).toBe(200);
    return res.body;
  };

  beforeAll(async () => {
    t = await startTestApp();
    await approvedSuite(t.db.dataSource, 'list-sqrt');
    kwame = await signInAs(t.app, 'maintainer');
    const target = (await t.db.dataSource.query(`SELECT name FROM targets WHERE installed ORDER BY name LIMIT 1`))[0]
      .name;
    for (const name of ['list nightly', 'list release']) {
      const plan = await kwame
        .post('/api/plans')
        .send({ name, recipients: [], suites: ['list-sqrt'], targets: [target] });
      started[plan.body.plan.id] = [];
      for (let i = 0; i < 4; i += 1) {
        const id = (await kwame.post('/api/runs').send({ planId: plan.body.plan.id })).body.run.id;
        started[plan.body.plan.id]!.push(id);
        // A plan has one queued or running run at a time: each but the last ends before the next starts.
        // The first two nightly runs finished; the others were cancelled.
        if (i < 3)
          await t.db.dataSource.query(`UPDATE runs SET status = $2 WHERE id = $1`, [
            id,
            name === 'list nightly' && i < 2 ? 'completed' : 'cancelled',
          ]);
      }
    }
    [nightly, release] = Object.keys(started) as [string, string];
    // One of the finished nightly runs was started by the schedule.
    await t.db.dataSource.query(`UPDATE runs SET trigger = 'schedule', requested_by = NULL WHERE id = $1`, [
      started[nightly]![0],
    ]);
  });
  afterAll(() => t.stop());

  it('lists the newest runs first, with the plan and who started them', async () => {
    const { runs, next } = await list('');
    expect(runs.map((r) => r.id)).toEqual([...started[release]!].reverse().concat([...started[nightly]!].reverse()));
    expect(runs[0]).toMatchObject({
      planName: 'list release',
      trigger: 'manual',
      requestedBy: 'Kwame Asante',
      status: 'queued',
    });
    expect(next).toBeNull();
  });

  it('filters by plan, by status and by trigger, alone and together', async () => {
    expect((await list(`?plan=${nightly}`)).runs.map((r) => r.id)).toEqual([...started[nightly]!].reverse());
    expect((await list('?status=completed')).runs.map((r) => r.id)).toEqual([
      started[nightly]![1],
      started[nightly]![0],
    ]);
    expect((await list('?trigger=schedule')).runs.map((r) => r.id)).toEqual([started[nightly]![0]]);
    expect((await list(`?plan=${release}&status=completed`)).runs).toEqual([]);
    expect((await list(`?plan=${nightly}&status=queued&trigger=manual`)).runs.map((r) => r.id)).toEqual([
      started[nightly]![3],
    ]);
    expect((await list(`?plan=${nightly}&status=cancelled`)).runs.map((r) => r.id)).toEqual([started[nightly]![2]]);
  });

  it('pages by the last run of the previous page without repeating or losing a run', async () => {
    const seen: string[] = [];
    let before: string | null = null;
    let pages = 0;
    do {
      const page: { runs: RunView[]; next: string | null } = await list(`?limit=3${before ? `&before=${before}` : ''}`);
      expect(page.runs.length).toBeLessThanOrEqual(3);
      seen.push(...page.runs.map((r) => r.id));
      before = page.next;
      pages += 1;
    } while (before);
    expect(pages).toBe(3);
    expect(seen).toEqual((await list('')).runs.map((r) => r.id));
  });

  it('names each bad filter', async () => {
    const res = await kwame.get('/api/runs?plan=nightly&status=done&trigger=cron&limit=0&colour=green');
    expect(res.status).toBe(400);
    expect(res.body.kind).toBe('invalid-input');
    expect(res.body.issues.map((i: { field: string }) => i.field).sort()).toEqual([
      'query',
      'query.limit',
      'query.plan',
      'query.status',
      'query.trigger',
    ]);
  });
});
