import { complexJsTarget } from '../../../harness/adapters/complex-js-target';
import type { Target } from '../../../harness/adapters/target';
import { User } from '../../../server/entities/user';
import type { Diagnosis } from '../../../shared/diagnosis';
import { pointClass } from '../../../shared/point-class';
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
  let runId: string;
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
    runId = run.id;
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

  it('stores every label and the class of each failure, and counts failures by class on the shard and the run', async () => {
    const failures: { labels: Diagnosis[]; diagnosis: Diagnosis; finding_class: string }[] = await db.dataSource.query(
      `SELECT labels, diagnosis, finding_class FROM failures WHERE run_id = $1 AND outcome_kind = 'fail'`,
      [runId],
    );
    // complex.js 2.4.3 ignores the sign of a zero on sqrt's cut: the fixture is only useful if some points fail.
    expect(failures.length).toBeGreaterThan(0);
    for (const f of failures) {
      expect(f.labels[0]).toEqual(f.diagnosis);
      expect(f.finding_class).toBe(pointClass(f.labels));
    }
    const expected = {
      branch: failures.filter((f) => f.finding_class === 'branch').length,
      accuracy: failures.filter((f) => f.finding_class === 'accuracy').length,
    };
    const [shard] = await db.dataSource.query(
      `SELECT by_class FROM shards WHERE run_id = $1 AND target_name = 'fine@1'`,
      [runId],
    );
    expect(shard.by_class).toEqual(expected);
    const [run] = await db.dataSource.query(`SELECT counts, by_class FROM runs WHERE id = $1`, [runId]);
    expect(run.by_class).toEqual(expected);
    expect(run.counts).toMatchObject({ fail: failures.length, notApplicable: 0 });
  });

  it("runs the suite's property checks after the values", () => {
    expect(rows.find((r) => r.target_name === 'fine@1')!.checked.properties).toEqual(
      expect.objectContaining({ run: true, note: '3 property check(s) run' }),
    );
  });
});
