import type request from 'supertest';
import { complexJsTarget } from '../../../harness/adapters/complex-js-target';
import type { RunMatrixCell } from '../../../shared/run-matrix-cell';
import { approvedSuite } from '../../setup/approved-suite';
import { executeRunShards } from '../../setup/execute-run-shards';
import { signInAs } from '../../setup/sign-in-as';
import { startTestApp, type TestApp } from '../../setup/test-app';
import { withoutOperation } from '../../setup/without-operation';

describe('GET /api/runs/:id/matrix', () => {
  let t: TestApp;
  let kwame: request.Agent;
  let runId: string;

  beforeAll(async () => {
    t = await startTestApp();
    await t.db.dataSource.query(
      `INSERT INTO targets (name, library, version, settings, installed, last_seen_at) VALUES ('nosqrt@1', 'nosqrt', '1', '{}', true, now()), ('fine@1', 'fine', '1', '{}', true, now())`,
    );
    await approvedSuite(t.db.dataSource, 'matrix-sqrt', 'sqrt-principal-sz');
    kwame = await signInAs(t.app, 'maintainer');
    const plan = await kwame
      .post('/api/plans')
      .send({ name: 'matrix plan', recipients: [], suites: ['matrix-sqrt'], targets: ['fine@1', 'nosqrt@1'] });
    runId = (await kwame.post('/api/runs').send({ planId: plan.body.plan.id })).body.run.id;
    const base = (name: string) => ({ ...complexJsTarget('complex.js', '2.4.3'), name });
    // A library without sqrt: every point of every path is skipped for that reason.
    await executeRunShards(t.db.dataSource, runId, (name) =>
      name === 'nosqrt@1' ? withoutOperation(base(name), 'sqrt') : base(name),
    );
  }, 60_000);
  afterAll(() => t.stop());

  it('gives each cell the reasons its points were skipped, summed over its paths, with the operations its target lacks', async () => {
    const res = await kwame.get(`/api/runs/${runId}/matrix`);
    expect(res.status).toBe(200);
    const cells = res.body.cells as RunMatrixCell[];
    const lacking = cells.find((c) => c.target === 'nosqrt@1')!;
    expect(lacking.outcome).toBe('error');
    expect(lacking.counts).toMatchObject({ pass: 0, fail: 0, skipped: 154 });
    expect(lacking.skipReasons).toEqual([{ reason: 'nosqrt@1 has no sqrt', count: 154, lacks: ['sqrt'] }]);
    expect(cells.find((c) => c.target === 'fine@1')!.skipReasons).toEqual([]);
  });

  it('gives a cell not yet done no reasons', async () => {
    const again = await kwame.post('/api/runs').send({
      planId: (await t.db.dataSource.query(`SELECT plan_id FROM runs WHERE id = $1`, [runId]))[0].plan_id,
    });
    const cells = (await kwame.get(`/api/runs/${again.body.run.id}/matrix`)).body.cells as RunMatrixCell[];
    expect(cells.map((c) => [c.status, c.skipReasons])).toEqual([
      ['queued', []],
      ['queued', []],
    ]);
  });
});
