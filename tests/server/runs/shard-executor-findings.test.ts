import { User } from '../../../server/entities/user';
import { searchFailures } from '../../../server/failures/failure-search';
import type { MailOutbox } from '../../../server/mail/mail-outbox';
import { PlanService } from '../../../server/plans/plan-service';
import { RunService } from '../../../server/runs/run-service';
import { ShardExecutor } from '../../../server/runs/shard-executor';
import type { Diagnosis } from '../../../shared/diagnosis';
import type { PointFinding, SuiteTargetResult } from '../../../shared/run-result';
import { approvedSuite } from '../../setup/approved-suite';
import { idleShardQueue } from '../../setup/idle-shard-queue';
import { createTestDatabase, type TestDatabase } from '../../setup/test-database';

// The harness's findings as the contract gives them (shared/run-result.ts), built here rather than
// evaluated, so storing them is tested apart from computing them.
const mockResult: { current: SuiteTargetResult | null } = { current: null };
jest.mock('../../../harness', () => ({
  ...jest.requireActual('../../../harness'),
  evaluatePair: async () => ({ result: mockResult.current, target: null }),
}));

const finding = (index: number, outcome: PointFinding['outcome'], over: Partial<PointFinding> = {}): PointFinding => ({
  path: 'p',
  index,
  t: index / 10,
  z: { re: '-1', im: String(index) },
  zHex: { re: '-0x1p+0', im: `0x${index}p+0` },
  expected: { re: '0', im: '3.141592653589793' },
  actual: { re: '0', im: '-3.141592653589793' },
  outcome,
  rule: 'DLMF 4.2.3',
  reproducer: 'x',
  ...over,
});

describe('the shard executor storing findings', () => {
  let db: TestDatabase;
  let runId: string;
  const cut: Diagnosis = { kind: 'cut-side' };
  const lost: Diagnosis = {
    kind: 'inaccurate',
    ulps: 4.4e18,
    relativeError: 1.96e-15,
    part: 'im',
    cancellation: { part: 'im', absoluteError: 1.96e-15, magnitude: 1 },
  };
  const steps = [
    { text: 'pow(z, 13)', library: { re: '-1', im: '-1.96e-15' }, reference: { re: '-1', im: '0' }, left: true },
  ];

  beforeAll(async () => {
    db = await createTestDatabase();
    await db.dataSource.query(
      `INSERT INTO targets (name, library, version, settings, installed, last_seen_at) VALUES ('fine@1', 'fine', '1', '{}', true, now())`,
    );
    await approvedSuite(db.dataSource, 'store-log', 'sqrt-principal-sz');
    const kwame = await db.dataSource.getRepository(User).findOneByOrFail({ email: 'kwame@sheetkeeper.test' });
    const plan = await new PlanService(db.dataSource).save(
      kwame,
      { name: 'store plan', description: '', recipients: [], suites: ['store-log'], targets: ['fine@1'] },
      null,
    );
    const { run } = await new RunService(db.dataSource, idleShardQueue()).start(plan.id, 'manual', kwame);
    runId = run.id;
    const findings = [
      finding(
        0,
        { kind: 'fail', diagnosis: cut, labels: [cut, lost], ulps: 4.4e18, relativeError: 2 },
        {
          steps,
          firstLeftStep: 0,
        },
      ),
      finding(
        1,
        { kind: 'fail', diagnosis: lost, labels: [lost], ulps: 4.4e18, relativeError: 1.96e-15 },
        {
          choice: 'acsc(0) is taken as asin(1/z) with 1/(+0) = +∞',
        },
      ),
      finding(2, { kind: 'not-applicable', reason: 'the entry takes plain numbers and cannot carry −0' }),
    ];
    const counts = { pass: 7, fail: 2, error: 0, skipped: 0, notApplicable: 1 };
    mockResult.current = {
      suite: { id: 'store-log', version: 1, title: 't', subject: 'log(z^13)' },
      target: { name: 'fine@1', library: 'fine', version: '1' } as SuiteTargetResult['target'],
      status: 'fail',
      checked: {
        convention: 'signed-zero',
        branch: 'principal',
        tolerance: '4 ulps per part',
        paths: 1,
        points: 10,
        properties: { listed: [], run: false, note: '' },
      },
      counts,
      byDiagnosis: { 'cut-side': 1, inaccurate: 2 },
      byClass: { branch: 1, accuracy: 1 },
      paths: [
        {
          name: 'p',
          kind: 'segment',
          points: 10,
          counts,
          byDiagnosis: { 'cut-side': 1, inaccurate: 2 },
          byClass: { branch: 1, accuracy: 1 },
          jumps: null,
          monodromy: null,
          skipped: [],
          findings,
          findingsOmitted: 0,
        },
      ],
      properties: null,
      errors: [],
      durationMs: 1,
      reference: { computed: 0, cached: 0 },
    };
    const executor = new ShardExecutor(db.dataSource, {
      openTarget: () => null,
      outbox: { enqueue: async () => undefined } as unknown as MailOutbox,
      appUrl: 'http://127.0.0.1',
    });
    for (const { id } of await db.dataSource.query(`SELECT id FROM shards WHERE run_id = $1`, [runId]))
      await executor.execute(id);
  }, 60_000);
  afterAll(() => db.drop());

  it('stores every label, the class, the steps with the first that left, and a convention choice', async () => {
    const rows = await db.dataSource.query(
      `SELECT point_index, diagnosis_kind, labels, finding_class, steps, first_left_step, choice
         FROM failures WHERE run_id = $1 ORDER BY point_index`,
      [runId],
    );
    expect(rows).toEqual([
      {
        point_index: 0,
        diagnosis_kind: 'cut-side',
        labels: [cut, lost],
        finding_class: 'branch',
        steps,
        first_left_step: 0,
        choice: null,
      },
      {
        point_index: 1,
        diagnosis_kind: 'inaccurate',
        labels: [lost],
        finding_class: 'accuracy',
        steps: null,
        first_left_step: null,
        choice: 'acsc(0) is taken as asin(1/z) with 1/(+0) = +∞',
      },
    ]);
  });

  it('serves a stored finding’s steps, first step that left and choice under the names the app reads', async () => {
    // The case page reads these keys (shared/failure-row-fields.ts); a column read back under its
    // SQL name (first_left_step) left the page saying that no step had left.
    const [first] = await db.dataSource.query(`SELECT id::text FROM failures WHERE run_id = $1 AND point_index = 0`, [
      runId,
    ]);
    const { rows } = await searchFailures(db.dataSource, { sort: 'id', limit: 1 }, true, first.id);
    expect(rows[0]).toMatchObject({ steps, firstLeftStep: 0, choice: null });
  });

  it('counts a point not applicable to the entry on the run and the shard, and stores no failure for it', async () => {
    const [run] = await db.dataSource.query(`SELECT counts, by_class FROM runs WHERE id = $1`, [runId]);
    expect(run.counts).toEqual({ pass: 7, fail: 2, error: 0, skipped: 0, notApplicable: 1 });
    expect(run.by_class).toEqual({ branch: 1, accuracy: 1 });
    const [shard] = await db.dataSource.query(`SELECT counts, by_class FROM shards WHERE run_id = $1`, [runId]);
    expect(shard.counts.notApplicable).toBe(1);
    expect(shard.by_class).toEqual({ branch: 1, accuracy: 1 });
  });
});
