import { syncTargets } from '../../../server/targets/sync-targets';
import { createTestDatabase, type TestDatabase } from '../../setup/test-database';
import { readyTargetSource } from '../../setup/ready-target-source';

describe('syncTargets', () => {
  let db: TestDatabase;
  const installed = async (name: string) =>
    (await db.dataSource.query(`SELECT installed FROM targets WHERE name = $1`, [name]))[0]?.installed;

  beforeAll(async () => {
    db = await createTestDatabase();
  });
  afterAll(() => db.drop());

  it('keeps the targets of ready added sources installed at a server start, and no others', async () => {
    await readyTargetSource(db.dataSource, { kind: 'program', command: ['/usr/bin/python3', 'a.py'] }, 'kept@1');
    await db.dataSource.query(
      `INSERT INTO targets (name, library, version, settings, installed, last_seen_at) VALUES ('gone@1', 'gone', '1', '{}', true, now())`,
    );
    await syncTargets(db.dataSource, [{ name: 'built-in@1', library: 'built-in', version: '1', settings: {} }]);
    expect([await installed('kept@1'), await installed('built-in@1'), await installed('gone@1')]).toEqual([
      true,
      true,
      false,
    ]);
  });

  it('keeps a target that only a live worker announces installed, and drops it once that worker has stopped', async () => {
    await db.dataSource.query(
      `INSERT INTO targets (name, library, version, settings, installed, last_seen_at) VALUES ('on-a-worker@1', 'w', '1', '{}', true, now())`,
    );
    const [{ id }] = await db.dataSource.query(
      `INSERT INTO workers (label, targets) VALUES ('elsewhere:1', ARRAY['on-a-worker@1']) RETURNING id`,
    );
    await syncTargets(db.dataSource, []);
    expect(await installed('on-a-worker@1')).toBe(true);
    await db.dataSource.query(`UPDATE workers SET stopped_at = now() WHERE id = $1`, [id]);
    await syncTargets(db.dataSource, []);
    expect(await installed('on-a-worker@1')).toBe(false);
  });
});
