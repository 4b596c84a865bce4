import { complexJsTarget } from '../../../harness/adapters/complex-js-target';
import type { Target } from '../../../harness/adapters/target';
import { User } from '../../../server/entities/user';
import type { MailOutbox } from '../../../server/mail/mail-outbox';
import { PlanService } from '../../../server/plans/plan-service';
import { RunService } from '../../../server/runs/run-service';
import { ShardExecutor } from '../../../server/runs/shard-executor';
import { approvedSuite } from '../../setup/approved-suite';
import { idleShardQueue } from '../../setup/idle-shard-queue';
import { createTestDatabase, type TestDatabase } from '../../setup/test-database';

/** complex.js, except that it never answers (a library stuck waiting); remembers whether it was closed. */
function hung(closed: string[]): Target {
  const base = complexJsTarget('complex.js', '2.4.3');
  return {
    ...base,
    name: 'hung@1',
    library: 'hung',
    version: '1',
    evaluate: () => new Promise<never>(() => undefined),
    evaluateColumns: undefined,
    close: async () => void closed.push('hung@1'),
  };
}

interface ShardRow {
  target_name: string;
  outcome: string;
  counts: { pass: number; fail: number; error: number; skipped: number };
  checked: { tolerance: string; paths: number; points: number; properties: { run: boolean; note: string } };
  errors: string[];
}

describe('the shard executor', () => {
  let db: TestDatabase;
  let rows: ShardRow[];
  let errorPaths: number;
  const closed: string[] = [];

  beforeAll(async () => {
    db = await createTestDatabase();
    await db.dataSource.query(
      `INSERT INTO targets (name, library, version, settings, installed, last_seen_at) VALUES ('ghost@1', 'ghost', '1', '{}', true, now()), ('hung@1', 'hung', '1', '{}', true, now()), ('fine@1', 'fine', '1', '{}', true, now())`,
    );
    await approvedSuite(db.dataSource, 'exec-sqrt', 'sqrt-principal-sz');
    const kwame = await db.dataSource.getRepository(User).findOneByOrFail({ email: 'kwame@sheetkeeper.test' });
    const plan = await new PlanService(db.dataSource).save(
      kwame,
      {
        name: 'executor plan',
        description: '',
        recipients: [],
        suites: ['exec-sqrt'],
        targets: ['ghost@1', 'hung@1', 'fine@1'],
      },
      null,
    );
    const { run } = await new RunService(db.dataSource, idleShardQueue()).start(plan.id, 'manual', kwame);
    const executor = new ShardExecutor(db.dataSource, {
      openTarget: (name) =>
        name === 'hung@1'
          ? hung(closed)
          : name === 'fine@1'
            ? { ...complexJsTarget('complex.js', '2.4.3'), name }
            : null,
      outbox: { enqueue: async () => undefined } as unknown as MailOutbox,
      appUrl: 'http://127.0.0.1',
      shardTimeoutMs: 500,
    });
    for (const { id } of await db.dataSource.query(`SELECT id FROM shards WHERE run_id = $1`, [run.id]))
      await executor.execute(id);
    rows = await db.dataSource.query(
      `SELECT target_name, outcome, counts, checked, errors FROM shards WHERE run_id = $1 ORDER BY target_name`,
      [run.id],
    );
    [{ n: errorPaths }] = await db.dataSource.query(
      `SELECT count(*)::int AS n FROM path_summaries WHERE run_id = $1 AND error IS NOT NULL`,
      [run.id],
    );
  }, 60_000);
  afterAll(() => db.drop());

  it("stores an error result that carries the suite's tolerance text and what was to be checked, like a result of its own", () => {
    const byName = Object.fromEntries(rows.map((r) => [r.target_name, r]));
    expect(byName['fine@1']!.checked.tolerance).toBe('4 ulps per part or relative error 8.881784197001252e-16 (4 eps)');
    for (const name of ['ghost@1', 'hung@1']) {
      expect(byName[name]!.outcome).toBe('error');
      expect(byName[name]!.checked).toMatchObject({
        tolerance: '4 ulps per part or relative error 8.881784197001252e-16 (4 eps)',
        paths: 3,
        points: 154,
      });
      expect(byName[name]!.counts).toEqual({ pass: 0, fail: 0, error: 154, skipped: 0, notApplicable: 0 });
      expect(byName[name]!.checked.properties).toEqual(
        expect.objectContaining({ run: false, note: 'listed in the suite but not run by this run' }),
      );
    }
    // Each path of both error shards is stored with the reason.
    expect(errorPaths).toBe(6);
  });

  it('names a target that is not installed on this worker', () => {
    expect(rows.find((r) => r.target_name === 'ghost@1')!.errors).toEqual([
      'the evaluation failed: target ghost@1 is not installed on this worker',
    ]);
  });

  it('stops a target that does not answer at the time limit, with the words the CLI uses, and closes it', () => {
    expect(rows.find((r) => r.target_name === 'hung@1')!.errors).toEqual([
      'hung@1 did not finish within the time limit of 500 ms; the evaluation was stopped and the target restarted',
    ]);
    expect(closed).toEqual(['hung@1']);
  });

  it("runs the suite's property checks after the values", () => {
    expect(rows.find((r) => r.target_name === 'fine@1')!.checked.properties).toEqual(
      expect.objectContaining({ run: true, note: '3 property check(s) run' }),
    );
  });
});
