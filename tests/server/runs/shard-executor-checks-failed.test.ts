import type request from 'supertest';
import type { ComplexPair } from '../../../harness/adapters/complex-pair';
import { describeMatrixCell } from '../../../components/runs/describe-matrix-cell';
import { runVerdict } from '../../../components/runs/run-verdict';
import { tallyCells } from '../../../components/runs/tally-cells';
import { ChecksFailed1765000000000 } from '../../../server/migrations/1765000000000-checks-failed';
import { referenceTarget } from '../../harness/support/reference-target';
import { approvedSuite } from '../../setup/approved-suite';
import { executeRunShards } from '../../setup/execute-run-shards';
import { runEverywhere } from '../../setup/run-everywhere';
import { signInAs } from '../../setup/sign-in-as';
import { startTestApp, type TestApp } from '../../setup/test-app';

/**
 * A library whose sqrt is right at every point of the demo suite (|z| ≥ 0.5 there) and 1.5 times
 * too large inside |z| < 0.25, where only the suite's property laws draw points: the root-power law
 * sqrt(z)² = z (DLMF 4.2.8 with the principal branch, common practice) fails while every point
 * passes. Through the real shard executor, the run's verdict, list, Overview and matrix must all say
 * it failed, never "all checked points passed".
 */
describe('checks that fail on a law with every point passed, counted as shards are stored', () => {
  let t: TestApp;
  let kwame: request.Agent;
  let runId: string;
  let planId: string;

  beforeAll(async () => {
    t = await startTestApp();
    await t.db.dataSource.query(
      `INSERT INTO targets (name, library, version, settings, installed, last_seen_at)
       VALUES ('smallwrong@1', 'smallwrong', '1', '{}', true, now()), ('fine@1', 'fine', '1', '{}', true, now())`,
    );
    await approvedSuite(t.db.dataSource, 'law-sqrt', 'sqrt-principal-sz');
    kwame = await signInAs(t.app, 'maintainer');
    const plan = await kwame.post('/api/plans').send({
      name: 'law plan',
      recipients: [],
      suites: ['law-sqrt'],
      targets: ['fine@1', 'smallwrong@1'],
    });
    planId = plan.body.plan.id;
    runId = (await kwame.post('/api/runs').send({ planId })).body.run.id;
    const wrongNearZero = {
      sqrt: (args: ComplexPair[], reference: (op: string, a: ComplexPair[]) => ComplexPair): ComplexPair => {
        const [re, im] = reference('sqrt', args);
        const [zr, zi] = args[0]!;
        const small = Math.hypot(zr, zi) < 0.25 && (zr !== 0 || zi !== 0);
        return small ? [re * 1.5, im * 1.5] : [re, im];
      },
    };
    await executeRunShards(t.db.dataSource, runId, (name) =>
      name.startsWith('smallwrong')
        ? referenceTarget('signed-zero', wrongNearZero, name)
        : referenceTarget('signed-zero', {}, name),
    );
  }, 60_000);
  afterAll(() => t.stop());

  const views = () => runEverywhere(kwame, planId, runId);

  it('fails the pair on its law alone: every point passed, the outcome is fail, and the cell says which', async () => {
    const { cells } = await views();
    const wrong = cells.find((c) => c.target === 'smallwrong@1')!;
    const fine = cells.find((c) => c.target === 'fine@1')!;
    expect(wrong.counts).toMatchObject({ fail: 0, error: 0 });
    expect(wrong.counts!.pass).toBeGreaterThan(0);
    expect(wrong.outcome).toBe('fail');
    expect(wrong.lawsFailed).toBeGreaterThanOrEqual(1);
    expect(wrong.loopsFailed).toEqual([]);
    expect([fine.outcome, fine.lawsFailed]).toEqual(['pass', 0]);
    const words = cells.map((c) => describeMatrixCell(c, runId));
    expect(tallyCells(words)).toMatchObject({ total: 2, pass: 1, fail: 1 });
    expect(words[cells.indexOf(wrong)]!.headline).toMatch(/^❌ \d+ property laws? failed$/);
  });

  it('stores the count of failed checks on the run, and the list, run view and Overview judge by it alike', async () => {
    const { listed, one, card } = await views();
    expect(one.counts.fail).toBe(0);
    expect([listed.checksFailed, one.checksFailed, card.checksFailed]).toEqual([1, 1, 1]);
    const said = [listed, one, card].map((v) => runVerdict(v).said);
    expect(said).toEqual(
      Array(3).fill('completed with failures, 1 check failed a property law or monodromy check; every point passed'),
    );
  });

  it('counts the failed checks of runs stored before the counter when the migration runs', async () => {
    const runner = t.db.dataSource.createQueryRunner();
    try {
      const migration = new ChecksFailed1765000000000();
      await migration.down(runner);
      await migration.up(runner);
    } finally {
      await runner.release();
    }
    expect((await views()).one.checksFailed).toBe(1);
  });
});
