import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { resolveTargetSource } from '../../../harness';
import { User } from '../../../server/entities/user';
import type { MailOutbox } from '../../../server/mail/mail-outbox';
import { PlanService } from '../../../server/plans/plan-service';
import { RunService } from '../../../server/runs/run-service';
import { ShardExecutor } from '../../../server/runs/shard-executor';
import { availableTargetOpener } from '../../../server/targets/available-target-opener';
import { TargetSourceResolver } from '../../../server/targets/target-source-resolver';
import { targetSourceOptions } from '../../../server/targets/target-source-options';
import { approvedSuite } from '../../setup/approved-suite';
import { idleShardQueue } from '../../setup/idle-shard-queue';
import { createTestDatabase, type TestDatabase } from '../../setup/test-database';

interface ShardRow {
  outcome: string;
  counts: { pass: number; fail: number; error: number };
  errors: string[];
}

describe('a worker opening an admin-added target', () => {
  let db: TestDatabase;
  let cacheDir: string;
  let rows: ShardRow[];
  let resolutions = 0;
  let unknown: unknown;
  let reopened: string | undefined;

  beforeAll(async () => {
    db = await createTestDatabase();
    cacheDir = mkdtempSync(path.join(tmpdir(), 'sheetkeeper-targets-'));
    const options = targetSourceOptions(cacheDir);
    // Python's cmath adapter as a program source, resolved as the server does after an admin adds it.
    const [{ id }] = await db.dataSource.query(`INSERT INTO target_sources (source) VALUES ($1) RETURNING id`, [
      JSON.stringify({
        kind: 'program',
        command: ['/usr/bin/python3', 'harness/adapters/python/cmath_adapter.py'],
        name: 'cmath-worker@1',
      }),
    ]);
    const resolver = new TargetSourceResolver(db.dataSource, options);
    resolver.later(id);
    await resolver.idle();

    await approvedSuite(db.dataSource, 'added-sqrt', 'sqrt-principal-sz');
    const kwame = await db.dataSource.getRepository(User).findOneByOrFail({ email: 'kwame@sheetkeeper.test' });
    const plan = await new PlanService(db.dataSource).save(
      kwame,
      {
        name: 'added plan',
        description: '',
        recipients: [],
        suites: ['added-sqrt'],
        targets: ['cmath-worker@1'],
      },
      null,
    );
    const { run } = await new RunService(db.dataSource, idleShardQueue()).start(plan.id, 'manual', kwame);
    const openTarget = availableTargetOpener(db.dataSource, options, (source, o) => {
      resolutions += 1;
      return resolveTargetSource(source, o);
    });
    const executor = new ShardExecutor(db.dataSource, {
      openTarget,
      outbox: { enqueue: async () => undefined } as unknown as MailOutbox,
      appUrl: 'http://127.0.0.1',
      referenceCacheDir: null,
    });
    for (const { id: shardId } of await db.dataSource.query(`SELECT id FROM shards WHERE run_id = $1`, [run.id]))
      await executor.execute(shardId);
    rows = await db.dataSource.query(`SELECT outcome, counts, errors FROM shards WHERE run_id = $1`, [run.id]);
    // A second shard's open: the descriptors kept from the first resolution open a fresh program.
    const again = await openTarget('cmath-worker@1');
    reopened = again?.name;
    await again?.close();
    unknown = await openTarget('never-added@1');
  }, 60_000);
  afterAll(async () => {
    await db.drop();
    rmSync(cacheDir, { recursive: true, force: true });
  });

  it('runs the shard on the added program, with values checked and no error', () => {
    expect(rows).toHaveLength(1);
    for (const row of rows) {
      expect({ errors: row.errors, error: row.counts.error }).toEqual({ errors: [], error: 0 });
      expect(row.counts.pass).toBeGreaterThan(0);
    }
  });

  it('resolves the source once for the process, not once per shard', () => {
    expect(reopened).toBe('cmath-worker@1');
    expect(resolutions).toBe(1);
  });

  it('opens nothing for a name neither installed nor added', () => {
    expect(unknown).toBeNull();
  });
});
