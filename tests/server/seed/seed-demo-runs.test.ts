import { seedDemoCatalogue } from '../../../server/seed/seed-demo-catalogue';
import { seedDemoRuns } from '../../../server/seed/seed-demo-runs';
import { rmSync } from 'node:fs';
import { seededReferenceCacheDir } from '../../setup/seeded-reference-cache-dir';
import { createTestDatabase, type TestDatabase } from '../../setup/test-database';

describe('seedDemoRuns', () => {
  let db: TestDatabase;
  const referenceCacheDir = seededReferenceCacheDir();
  beforeAll(async () => {
    db = await createTestDatabase();
    await seedDemoCatalogue(db.dataSource);
  }, 60_000);
  afterAll(async () => {
    await db.drop();
    rmSync(referenceCacheDir, { recursive: true, force: true });
  });

  it('adds two completed nightly runs, the second with regressions from the complex.js upgrade and one regression mail, then nothing the second time', async () => {
    const options = { smtp: { host: '127.0.0.1', port: 9 }, appUrl: 'http://127.0.0.1:8460', referenceCacheDir };
    expect(await seedDemoRuns(db.dataSource, options)).toBe(2);
    const runs = await db.dataSource.query(
      `SELECT status, shards_total AS "shards", regressions FROM runs ORDER BY created_at`,
    );
    expect(runs.map((r: { status: string }) => r.status)).toEqual(['completed', 'completed']);
    // complex.js 2.4.1 started giving +0 where 2.3.0 gave the Annex G −0 (exp(3 − 0i), log(1 − 0i)):
    // seen with `sheetkeeper matrix --library complex.js`, so the upgrade must show as regressions.
    expect(runs[1].regressions).toBeGreaterThan(0);
    const [{ failures }] = await db.dataSource.query(
      `SELECT count(*)::int AS failures FROM failures WHERE is_regression AND target_version <> '2.3.0'`,
    );
    expect(failures).toBe(runs[1].regressions);
    const mail = await db.dataSource.query(`SELECT subject, text_body AS text FROM outbox_mail`);
    expect(mail).toHaveLength(1);
    expect(mail[0].subject).toMatch(/regression/);
    // The demo mail opens with its summary by kind, before any regression is listed.
    const text: string = mail[0].text;
    expect(text).toContain(`All ${runs[1].regressions} in the failure table: `);
    expect(text.indexOf('Summary by kind')).toBeGreaterThan(0);
    expect(text.indexOf('Summary by kind')).toBeLessThan(text.indexOf('  input     z ='));
    const [plan] = await db.dataSource.query(
      `SELECT array_agg(target_name ORDER BY target_name) AS targets FROM plan_targets pt JOIN plans p ON p.id = pt.plan_id WHERE p.name = 'complex.js nightly'`,
    );
    expect(plan.targets).not.toContain('complex.js@2.3.0');
    // The Decisions screen's story: a bug verdict in force on the newest release, and an
    // accepted deviation on the earlier one that has expired; neither changes the regressions.
    const decisions = await db.dataSource.query(
      `SELECT classification, versions, target_version AS version, expires_at < now() AS expired FROM deviations ORDER BY created_at DESC`,
    );
    expect(decisions).toEqual([
      {
        classification: 'bug',
        versions: 'this-and-later',
        version: expect.not.stringMatching(/^2\.3\.0$/),
        expired: null,
      },
      { classification: 'accepted', versions: 'this-version', version: '2.3.0', expired: true },
    ]);
    expect(await seedDemoRuns(db.dataSource, options)).toBe(0);
    expect(await db.dataSource.query(`SELECT count(*)::int AS n FROM deviations`)).toEqual([{ n: 2 }]);
  }, 180_000);
});
