import { WorkerRegistration } from '../../../server/runs/worker-registration';
import { WORKER_LIVENESS } from '../../../server/runs/worker-liveness';
import { liveWorkerSql } from '../../../server/sql/live-worker-sql';
import { createTestDatabase, type TestDatabase } from '../../setup/test-database';

describe('WorkerRegistration', () => {
  let db: TestDatabase;
  beforeAll(async () => {
    db = await createTestDatabase();
  }, 60_000);
  afterAll(() => db.drop());

  const row = async (id: string) =>
    (
      await db.dataSource.query(
        `SELECT w.label, w.targets, w.stopped_at IS NOT NULL AS stopped, ${liveWorkerSql('w')} AS live FROM workers w WHERE w.id = $1`,
        [id],
      )
    )[0];

  it('announces its label and targets, counts as live while it holds its lock though its beat is old, and as gone once stopped', async () => {
    const worker = await WorkerRegistration.start(db.dataSource, db.url, {
      label: 'build-7:4121',
      findTargets: async () => ['complex.js@2.4.3'],
    });
    try {
      expect(await row(worker.id)).toEqual({
        label: 'build-7:4121',
        targets: ['complex.js@2.4.3'],
        stopped: false,
        live: true,
      });
      // A shard that blocks the worker's event loop stops its beats, not its lock.
      await db.dataSource.query(`UPDATE workers SET heartbeat_at = now() - interval '1 hour' WHERE id = $1`, [
        worker.id,
      ]);
      expect((await row(worker.id)).live).toBe(true);
    } finally {
      await worker.stop();
    }
    expect(await row(worker.id)).toMatchObject({ stopped: true, live: false });
  });

  it('counts a worker whose lock is gone and whose beat is older than the stale limit as dead (killed without stopping)', async () => {
    const [dead] = await db.dataSource.query(
      `INSERT INTO workers (label, targets, heartbeat_at) VALUES ('gone:1', '{x@1}', now() - make_interval(secs => $1)) RETURNING id::text`,
      [WORKER_LIVENESS.staleMs / 1000 + 1],
    );
    const [fresh] = await db.dataSource.query(
      `INSERT INTO workers (label, targets) VALUES ('just-killed:2', '{x@1}') RETURNING id::text`,
    );
    expect((await row(dead.id)).live).toBe(false);
    // Killed a moment ago: live until its beat is stale (WORKER_LIVENESS.staleMs).
    expect((await row(fresh.id)).live).toBe(true);
  });

  it('announces a target found after it started once it looks for targets again, and beats', async () => {
    let found = ['complex.js@2.4.3'];
    const worker = await WorkerRegistration.start(db.dataSource, db.url, {
      findTargets: async () => found,
      heartbeatMs: 50,
      targetsRefreshMs: 100,
    });
    try {
      expect(worker.label).toMatch(/^.+:\d+$/);
      const [{ at: startedBeat }] = await db.dataSource.query(`SELECT heartbeat_at AS at FROM workers WHERE id = $1`, [
        worker.id,
      ]);
      found = ['complex.js@2.4.3', 'complex.js@2.5.0'];
      const end = Date.now() + 5000;
      while ((await row(worker.id)).targets.length < 2 && Date.now() < end) await new Promise((r) => setTimeout(r, 20));
      expect((await row(worker.id)).targets).toEqual(found);
      expect(worker.targets).toEqual(found);
      const [{ at: laterBeat }] = await db.dataSource.query(`SELECT heartbeat_at AS at FROM workers WHERE id = $1`, [
        worker.id,
      ]);
      expect(laterBeat.getTime()).toBeGreaterThan(startedBeat.getTime());
    } finally {
      await worker.stop();
    }
  });
});
