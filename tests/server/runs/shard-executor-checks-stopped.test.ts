import type request from 'supertest';
import { tallyCells } from '../../../components/runs/tally-cells';
import { describeMatrixCell } from '../../../components/runs/describe-matrix-cell';
import { runVerdict } from '../../../components/runs/run-verdict';
import { ChecksStoppedByError1764980000000 } from '../../../server/migrations/1764980000000-checks-stopped-by-error';
import { referenceTarget } from '../../harness/support/reference-target';
import { approvedSuite } from '../../setup/approved-suite';
import { executeRunShards } from '../../setup/execute-run-shards';
import { runEverywhere } from '../../setup/run-everywhere';
import { signInAs } from '../../setup/sign-in-as';
import { startTestApp, type TestApp } from '../../setup/test-app';
import { withoutOperation } from '../../setup/without-operation';

/**
 * A run in which two libraries lack the suite's function (every point of those checks skipped,
 * as complex.js 2.4.2 lacks cbrt) and one has it, through the real shard executor: the count the
 * run stores, the runs list, the run view, the Overview and the run page's matrix tally agree.
 */
describe('checks stopped by an error, counted as shards are stored', () => {
  let t: TestApp;
  let kwame: request.Agent;
  let runId: string;
  let planId: string;

  beforeAll(async () => {
    t = await startTestApp();
    await t.db.dataSource.query(
      `INSERT INTO targets (name, library, version, settings, installed, last_seen_at)
       VALUES ('nosqrt@1', 'nosqrt', '1', '{}', true, now()), ('nosqrt@2', 'nosqrt', '2', '{}', true, now()),
              ('fine@1', 'fine', '1', '{}', true, now())`,
    );
    await approvedSuite(t.db.dataSource, 'stopped-sqrt', 'sqrt-principal-sz');
    kwame = await signInAs(t.app, 'maintainer');
    const plan = await kwame.post('/api/plans').send({
      name: 'stopped plan',
      recipients: [],
      suites: ['stopped-sqrt'],
      targets: ['fine@1', 'nosqrt@1', 'nosqrt@2'],
    });
    planId = plan.body.plan.id;
    runId = (await kwame.post('/api/runs').send({ planId })).body.run.id;
    // The reference engine as the library, so the check that has sqrt passes every point: by its
    // points alone the run would read "all checked points passed".
    const base = (name: string) => referenceTarget('signed-zero', {}, name);
    await executeRunShards(t.db.dataSource, runId, (name) =>
      name.startsWith('nosqrt') ? withoutOperation(base(name), 'sqrt') : base(name),
    );
  }, 60_000);
  afterAll(() => t.stop());

  const views = () => runEverywhere(kwame, planId, runId);

  it('stores the matrix’s count of stopped checks on the run, and the list, run view and Overview judge by it alike', async () => {
    const { listed, one, card, cells } = await views();
    const tally = tallyCells(cells.map((c) => describeMatrixCell(c, runId)));
    expect(tally).toMatchObject({ total: 3, pass: 1, error: 2 });
    expect(one.status).toBe('completed');
    // Every point of the two lacking checks was skipped: the points alone would read as a clean run.
    expect(one.counts).toMatchObject({ fail: 0, error: 0 });
    expect(one.counts.pass).toBeGreaterThan(0);
    expect([listed.checksStopped, one.checksStopped, card.checksStopped]).toEqual([2, 2, 2]);
    const said = [listed, one, card].map((v) => runVerdict(v).said);
    expect(said).toEqual(Array(3).fill('completed with errors, 2 checks stopped by an error'));
  });

  it('counts the stopped checks of runs stored before the counter when the migration runs', async () => {
    const runner = t.db.dataSource.createQueryRunner();
    try {
      const migration = new ChecksStoppedByError1764980000000();
      await migration.down(runner);
      await migration.up(runner);
    } finally {
      await runner.release();
    }
    const { one, cells } = await views();
    expect(one.checksStopped).toBe(tallyCells(cells.map((c) => describeMatrixCell(c, runId))).error);
    expect(one.checksStopped).toBe(2);
  });
});
