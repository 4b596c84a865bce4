import request from 'supertest';
import { OutboxMail } from '../../../server/entities/outbox-mail';
import { DIAGNOSIS_KIND_NAMES } from '../../../shared/diagnosis-kind-names';
import { DIAGNOSIS_KINDS } from '../../../shared/diagnosis-kinds';
import { approvedSuite } from '../../setup/approved-suite';
import { conjugatingLibraryRuns } from '../../setup/conjugating-library-runs';
import { signInAs } from '../../setup/sign-in-as';
import { startTestApp, type TestApp } from '../../setup/test-app';

/**
 * The regression mail markRegressions queues when a run completes, against the failure table it
 * links to: version 2 of a library conjugates √z in the upper half-plane, so the second run's
 * regressions are real branch findings, in two suites × one target.
 */
describe('markRegressions: the regression mail summary', () => {
  let t: TestApp;
  let kwame: request.Agent;
  let runId: string;
  let mail: OutboxMail;

  beforeAll(async () => {
    t = await startTestApp();
    const ds = t.db.dataSource;
    await approvedSuite(ds, 'sum-sqrt', 'sqrt-principal-sz');
    // Named to come first alphabetically; it has fewer regressions, so it must come second.
    await approvedSuite(ds, 'a-sqrt-half-power', 'sqrt-agrees-with-half-power');
    const plan = await conjugatingLibraryRuns(ds, 'sumlib', {
      name: 'summary plan',
      recipients: ['kwame@sheetkeeper.test'],
      suites: ['sum-sqrt', 'a-sqrt-half-power'],
    });
    await plan.runOn('1');
    runId = await plan.runOn('2');
    plan.close();
    mail = await ds.getRepository(OutboxMail).findOneByOrFail({ kind: 'regression' });
    kwame = await signInAs(t.app, 'maintainer');
  }, 120_000);
  afterAll(() => t.stop());

  it('counts each kind as many times as its link to the failure table shows rows, branch kinds first', async () => {
    const lines = mail.textBody.split('\n');
    const listed = DIAGNOSIS_KINDS.filter((k) =>
      lines.some((l) => l.startsWith(`    ${DIAGNOSIS_KIND_NAMES[k].name}: `)),
    );
    expect(listed.length).toBeGreaterThan(0);
    for (const kind of DIAGNOSIS_KINDS) {
      const rows = (await kwame.get(`/api/failures?run=${runId}&status=new&diagnosis=${kind}&limit=500`)).body.failures;
      const line = lines.find((l) => l.startsWith(`    ${DIAGNOSIS_KIND_NAMES[kind].name}: `));
      const link = `http://127.0.0.1:8460/failures?run=${runId}&status=new&diagnosis=${kind}`;
      expect({ kind, line }).toEqual({
        kind,
        line: rows.length > 0 ? `    ${DIAGNOSIS_KIND_NAMES[kind].name}: ${rows.length}   ${link}` : undefined,
      });
    }
    // Listed in DIAGNOSIS_KINDS' order, which puts branch kinds before accuracy.
    const at = listed.map((k) => mail.textBody.indexOf(`    ${DIAGNOSIS_KIND_NAMES[k].name}: `));
    expect(at).toEqual([...at].sort((a, b) => a - b));
  });

  it('names the affected target with its count and links every regression, before the first table', async () => {
    const [{ n }] = await t.db.dataSource.query(
      `SELECT count(*)::int AS n FROM failures WHERE run_id = $1 AND is_regression`,
      [runId],
    );
    expect(mail.textBody).toContain(`Affected: sumlib@2 (${n}).`);
    expect(mail.textBody).toContain(
      `All ${n} in the failure table: http://127.0.0.1:8460/failures?run=${runId}&status=new`,
    );
    expect(mail.textBody.indexOf('Summary by kind')).toBeLessThan(mail.textBody.indexOf('  input     z ='));
    expect(mail.htmlBody.indexOf('>Summary</h2>')).toBeLessThan(mail.htmlBody.indexOf('border="1"'));
  });

  it('lists the pair with more regressions first within a class, though its name comes later', async () => {
    const pairs: { suite_slug: string; n: number }[] = await t.db.dataSource.query(
      `SELECT suite_slug, count(*)::int AS n FROM failures WHERE run_id = $1 AND is_regression AND finding_class = 'branch'
        GROUP BY suite_slug ORDER BY n DESC`,
      [runId],
    );
    // What the scenario needs: two pairs, the larger one last by name (71 and 53 regressions measured).
    expect(pairs.map((p) => p.suite_slug)).toEqual(['sum-sqrt', 'a-sqrt-half-power']);
    expect(pairs[0]!.n).toBeGreaterThan(pairs[1]!.n);
    const headings = mail.textBody.split('\n').filter((l) => / × sumlib@2: \d+ regressions?/.test(l));
    expect(headings[0]).toBe(
      `sum-sqrt × sumlib@2: ${pairs[0]!.n} regressions${pairs[0]!.n > 50 ? ', 50 listed here' : ''}`,
    );
  });
});
