import { OutboxMail } from '../../../server/entities/outbox-mail';
import { checkStoppedSql } from '../../../server/sql/check-stopped-sql';
import { checkStoppedByError } from '../../../shared/check-stopped-by-error';
import { referenceTarget } from '../../harness/support/reference-target';
import { approvedSuite } from '../../setup/approved-suite';
import { libraryVersionRuns } from '../../setup/library-version-runs';
import { startTestApp, type TestApp } from '../../setup/test-app';
import { withoutOperation } from '../../setup/without-operation';

/**
 * Version 1 of a library has sqrt (the reference engine: every point passes); version 2 lost it,
 * as complex.js 2.4.2 lacks cbrt. Every point of the check is skipped, none fails, so no point
 * regresses; the nightly must still tell the people who hear of this plan's regressions.
 */
describe('checks judged last time and stopped by an error now', () => {
  let t: TestApp;
  let runs: Awaited<ReturnType<typeof libraryVersionRuns>>;
  const mails = () => t.db.dataSource.getRepository(OutboxMail).find({ where: { kind: 'regression' } });

  beforeAll(async () => {
    t = await startTestApp();
    const ds = t.db.dataSource;
    await approvedSuite(ds, 'lost-sqrt', 'sqrt-principal-sz');
    const [mei] = await ds.query(`SELECT id FROM users WHERE email = 'mei@sheetkeeper.test'`);
    await ds.query(`INSERT INTO subscriptions (user_id, target_key) VALUES ($1, 'lostlib')`, [mei.id]);
    runs = await libraryVersionRuns(
      ds,
      'lostlib',
      { name: 'lost plan', recipients: ['kwame@sheetkeeper.test'], suites: ['lost-sqrt'] },
      (version) => {
        const library = referenceTarget('signed-zero', {}, `lostlib@${version}`);
        return version === '1' ? library : withoutOperation(library, 'sqrt');
      },
    );
    await runs.runOn('1');
  }, 120_000);
  afterAll(async () => {
    runs.close();
    await t.stop();
  });

  it('mails the plan’s recipients and the library’s subscribers, naming the check and why, though no point regressed', async () => {
    const runId = await runs.runOn('2');
    const [run] = await t.db.dataSource.query(`SELECT regressions, checks_stopped FROM runs WHERE id = $1`, [runId]);
    expect(run).toEqual({ regressions: 0, checks_stopped: 1 });
    const [mail, ...others] = await mails();
    expect(others).toEqual([]);
    expect(mail!.subject).toBe(
      '[Sheetkeeper] 1 check stopped by an error in lost plan: checked last time, nothing judged now',
    );
    expect([...mail!.recipients].sort()).toEqual(['kwame@sheetkeeper.test', 'mei@sheetkeeper.test']);
    expect(mail!.textBody).toContain('Checks that ran last time and were stopped by an error now (1)');
    expect(mail!.textBody).toMatch(/ {2}lost-sqrt × lostlib@2: .*has no sqrt/);
    expect(mail!.textBody).toContain(`the run: http://127.0.0.1:8460/runs/${runId}`);
    expect(mail!.htmlBody).toMatch(/<li>lost-sqrt × lostlib@2: .*has no sqrt<\/li>/);
    // No summary by kind and no table: there is no regression to count or list.
    expect(mail!.textBody).not.toContain('Summary by kind');
    expect(mail!.htmlBody).not.toContain('border="1"');
  }, 60_000);

  it('mails no one again while the same check stays stopped', async () => {
    await runs.runOn('2');
    expect(await mails()).toHaveLength(1);
  }, 60_000);

  it('judges a stopped check in SQL as shared/check-stopped-by-error.ts does, shard by shard', async () => {
    const shards: { status: 'done'; outcome: 'pass' | 'fail' | 'error'; counts: never; stopped: boolean }[] =
      await t.db.dataSource.query(
        `SELECT s.status, s.outcome, s.counts, ${checkStoppedSql('s')} AS stopped FROM shards s`,
      );
    expect(shards.map((s) => s.stopped)).toEqual(expect.arrayContaining([true, false]));
    for (const s of shards) expect({ ...s, stopped: checkStoppedByError(s) }).toEqual(s);
  });
});
