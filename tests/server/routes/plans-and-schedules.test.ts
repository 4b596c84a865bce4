import request from 'supertest';
import { approvedSuite } from '../../setup/approved-suite';
import { demoSuiteBody } from '../../setup/demo-suite-body';
import { signInAs } from '../../setup/sign-in-as';
import { startTestApp, type TestApp } from '../../setup/test-app';

describe('plans and schedules', () => {
  let t: TestApp;
  let kwame: request.Agent;
  let target: string;
  const plan = (over: Record<string, unknown> = {}) => ({
    name: 'Nightly roots',
    recipients: ['kwame@sheetkeeper.test'],
    suites: ['plan-sqrt'],
    targets: [target],
    ...over,
  });

  beforeAll(async () => {
    t = await startTestApp();
    await approvedSuite(t.db.dataSource, 'plan-sqrt');
    kwame = await signInAs(t.app, 'maintainer');
    const targets = (await kwame.get('/api/targets')).body.targets as {
      name: string;
      library: string;
      installed: boolean;
    }[];
    target = targets.find((x) => x.library === 'complex.js' && x.installed)!.name;
  });
  afterAll(() => t.stop());

  it('lists the installed targets the harness finds, complex.js and cmath among them', async () => {
    const libraries = new Set(
      ((await kwame.get('/api/targets')).body.targets as { library: string }[]).map((x) => x.library),
    );
    expect([...libraries]).toEqual(expect.arrayContaining(['complex.js', 'mathjs', 'cmath']));
  });

  it('creates a plan of approved suites and installed targets, and edits it', async () => {
    const created = await kwame.post('/api/plans').send(plan());
    expect(created.status).toBe(201);
    expect(created.body.plan).toMatchObject({
      name: 'Nightly roots',
      suites: [{ slug: 'plan-sqrt', approvedVersion: 1 }],
      targets: [{ name: target, installed: true }],
      createdBy: 'Kwame Asante',
    });
    const edited = await kwame.put(`/api/plans/${created.body.plan.id}`).send(plan({ description: 'Roots only.' }));
    expect(edited.body.plan.description).toBe('Roots only.');
  });

  it('refuses a suite without an approved version, an unknown suite and an unknown target, naming each', async () => {
    const ravi = await signInAs(t.app, 'contributor');
    expect((await ravi.post('/api/suites').send(demoSuiteBody('draft-only'))).status).toBe(201);
    const res = await kwame.post('/api/plans').send(
      plan({
        name: 'Broken plan',
        suites: ['plan-sqrt', 'draft-only', 'no-such-suite'],
        targets: [target, 'nolib@0.0.0'],
      }),
    );
    expect(res.status).toBe(400);
    expect(res.body.issues).toEqual([
      { field: 'body.suites.1', rule: 'has no approved version yet ("draft-only")' },
      { field: 'body.suites.2', rule: 'names no suite ("no-such-suite")' },
    ]);
    const targetRes = await kwame.post('/api/plans').send(plan({ name: 'Broken plan', targets: ['nolib@0.0.0'] }));
    expect(targetRes.body.issues).toEqual([{ field: 'body.targets.0', rule: 'names no known target ("nolib@0.0.0")' }]);
  });

  it('refuses a second plan with the same name', async () => {
    const res = await kwame.post('/api/plans').send(plan());
    expect(res.status).toBe(400);
    expect(res.body.issues).toEqual([{ field: 'body.name', rule: 'is taken by another plan' }]);
  });

  it('schedules a plan and shows the next three times in its time zone', async () => {
    const planId = (await kwame.get('/api/plans')).body.plans[0].id;
    const res = await kwame.post('/api/schedules').send({ planId, cron: '30 2 * * *', timeZone: 'Europe/Oslo' });
    expect(res.status).toBe(201);
    const next = res.body.schedule.nextRuns.map((iso: string) => new Date(iso));
    expect(next).toHaveLength(3);
    for (const d of next) {
      // 02:30 in Oslo is 01:30 UTC in winter (CET) and 00:30 UTC in summer (CEST) — IANA tz database.
      expect(
        new Intl.DateTimeFormat('en-GB', { timeZone: 'Europe/Oslo', hour: '2-digit', minute: '2-digit' }).format(d),
      ).toBe('02:30');
    }
    expect(next[1].getTime() - next[0].getTime()).toBeGreaterThanOrEqual(23 * 3600 * 1000);
  });

  it('names the cron field that is wrong, and the time zone rule', async () => {
    const preview = await kwame.post('/api/schedules/preview').send({ cron: '61 2 * * *', timeZone: 'UTC' });
    expect(preview.status).toBe(400);
    expect(preview.body.issues).toEqual([{ field: 'body.cron', rule: 'has an invalid minute field: "61"' }]);
    const seven = await kwame.post('/api/schedules/preview').send({ cron: '0 0 2 * * * *', timeZone: 'UTC' });
    expect(seven.body.issues).toEqual([{ field: 'body.cron', rule: 'must have 5 or 6 fields (it has 7)' }]);
    const zone = await kwame.post('/api/schedules/preview').send({ cron: '0 2 * * *', timeZone: 'Mars/Olympus' });
    expect(zone.body.issues).toEqual([
      { field: 'body.timeZone', rule: 'must be a time zone name such as Europe/Oslo or UTC' },
    ]);
  });

  it('refuses a schedule that runs more often than every 15 minutes, in the preview, on create and on change', async () => {
    const planId = (await kwame.get('/api/plans')).body.plans[0].id;
    const before = (await kwame.get('/api/schedules')).body.schedules.length;
    const cases: [string, string][] = [
      ['* * * * * *', '1 s'],
      ['*/1 * * * *', '1 min'],
      ['0,5 * * * *', '5 min'],
      ['0 0,10 3 * * *', '10 min'],
    ];
    for (const [cron, apart] of cases) {
      const issues = [
        { field: 'body.cron', rule: `must leave at least 15 min between runs (this one runs ${apart} apart)` },
      ];
      const preview = await kwame.post('/api/schedules/preview').send({ cron, timeZone: 'UTC' });
      expect([cron, preview.status, preview.body.issues]).toEqual([cron, 400, issues]);
      const created = await kwame.post('/api/schedules').send({ planId, cron, timeZone: 'UTC' });
      expect([cron, created.status, created.body.issues]).toEqual([cron, 400, issues]);
    }
    expect((await kwame.get('/api/schedules')).body.schedules).toHaveLength(before);
    const [schedule] = (await kwame.get('/api/schedules')).body.schedules;
    const changed = await kwame.patch(`/api/schedules/${schedule.id}`).send({ cron: '*/5 * * * *' });
    expect(changed.status).toBe(400);
    expect((await kwame.get('/api/schedules')).body.schedules[0].cron).toBe(schedule.cron);
    expect((await kwame.post('/api/schedules/preview').send({ cron: '*/15 * * * *', timeZone: 'UTC' })).status).toBe(
      200,
    );
  });

  it('disables a schedule, which then has no next times', async () => {
    const [schedule] = (await kwame.get('/api/schedules')).body.schedules;
    const res = await kwame.patch(`/api/schedules/${schedule.id}`).send({ enabled: false });
    expect(res.body.schedule).toMatchObject({ enabled: false, nextRuns: [] });
  });
});
