import request from 'supertest';
import { failurePageJson } from '../../../server/failures/failure-page-json';
import { searchFailures } from '../../../server/failures/failure-search';
import { approvedSuite } from '../../setup/approved-suite';
import { signInAs } from '../../setup/sign-in-as';
import { startTestApp, type TestApp } from '../../setup/test-app';

describe('runs and the failure table', () => {
  let t: TestApp;
  let kwame: request.Agent;
  let runId: string;

  beforeAll(async () => {
    t = await startTestApp();
    await approvedSuite(t.db.dataSource, 'runs-sqrt');
    kwame = await signInAs(t.app, 'maintainer');
    const target = (
      await t.db.dataSource.query(
        `SELECT name FROM targets WHERE library = 'complex.js' AND installed ORDER BY name LIMIT 2`,
      )
    ).map((r: { name: string }) => r.name);
    const plan = await kwame
      .post('/api/plans')
      .send({ name: 'runs plan', recipients: [], suites: ['runs-sqrt'], targets: target });
    const run = await kwame.post('/api/runs').send({ planId: plan.body.plan.id });
    expect(run.status).toBe(202);
    runId = run.body.run.id;
    // 120 synthetic failing points: every third a branch finding (zero-sign, and every sixth
    // inaccurate too, as a second label), the rest accuracy findings; for filters and keyed pages.
    const [shard] = await t.db.dataSource.query(`SELECT id, suite_slug FROM shards WHERE run_id = $1 LIMIT 1`, [runId]);
    for (let i = 0; i < 120; i += 1) {
      const inaccurate = { kind: 'inaccurate', ulps: i, relativeError: i * 1e-16 };
      const labels =
        i % 3 === 0
          ? [{ kind: 'zero-sign', part: 'im', of: 'input' }, ...(i % 6 === 0 ? [inaccurate] : [])]
          : [inaccurate];
      const diagnosis = labels[0]!;
      await t.db.dataSource.query(
        `INSERT INTO failures (run_id, shard_id, suite_slug, suite_version, target_name, target_library, target_version, convention, path_name, point_index, t, z, z_hex, point_key, expected, actual, outcome_kind, diagnosis_kind, diagnosis, labels, finding_class, ulps, rule, reproducer, is_regression)
         VALUES ($1, $2, 'runs-sqrt', 1, 'complex.js@2.4.3', 'complex.js', '2.4.3', 'signed-zero', 'p', $3, $4, '{"re":"-4","im":"-0"}', '{"re":"-0x1p+2","im":"-0x0p+0"}', $5, '{"re":"0","im":"-2"}', '{"re":"0","im":"2"}', 'fail', $6, $7, $8, $9, $10, 'ISO/IEC 9899:2011 G.6.4.2', 'x', $11)`,
        [
          runId,
          shard.id,
          i,
          i / 120,
          `k${i}`,
          diagnosis.kind,
          JSON.stringify(diagnosis),
          JSON.stringify(labels),
          i % 3 === 0 ? 'branch' : 'accuracy',
          diagnosis.kind === 'inaccurate' ? i : null,
          i % 10 === 0,
        ],
      );
    }
  });
  afterAll(() => t.stop());

  it('starts a run of one shard per suite × target and shows it queued', async () => {
    const run = (await kwame.get(`/api/runs/${runId}`)).body.run;
    expect(run).toMatchObject({
      planName: 'runs plan',
      trigger: 'manual',
      status: 'queued',
      shardsTotal: 2,
      shardsDone: 0,
      requestedBy: 'Kwame Asante',
      counts: { pass: 0, fail: 0, error: 0, skipped: 0, notApplicable: 0 },
      byClass: { branch: 0, accuracy: 0 },
    });
    const matrix = (await kwame.get(`/api/runs/${runId}/matrix`)).body.cells;
    expect(matrix).toHaveLength(2);
    expect(matrix[0]).toMatchObject({ suite: 'runs-sqrt', status: 'queued' });
  });

  it('filters by diagnosis and by new, and pages without repeating a row', async () => {
    const zero = (await kwame.get(`/api/failures?run=${runId}&diagnosis=zero-sign&limit=500`)).body.failures;
    expect(zero).toHaveLength(40);
    expect(zero[0].labels[0]).toEqual({ kind: 'zero-sign', part: 'im', of: 'input' });
    expect((await kwame.get(`/api/failures?run=${runId}&status=new&limit=500`)).body.failures).toHaveLength(12);
    const seen = new Set<string>();
    let after: string | null = null;
    do {
      const page: { body: { failures: { id: string }[]; next: string | null } } = await kwame.get(
        `/api/failures?run=${runId}&limit=50${after ? `&after=${after}` : ''}`,
      );
      for (const f of page.body.failures) seen.add(f.id);
      after = page.body.next;
    } while (after);
    expect(seen.size).toBe(120);
  });

  it('filters by any label of a point, not only the leading one', async () => {
    const inaccurate = (await kwame.get(`/api/failures?run=${runId}&diagnosis=inaccurate&limit=500`)).body.failures;
    // 80 points labelled inaccurate alone, and 20 zero-sign points whose second label is inaccurate.
    expect(inaccurate).toHaveLength(100);
    expect(inaccurate.filter((f: { diagnosis: { kind: string } }) => f.diagnosis.kind === 'zero-sign')).toHaveLength(
      20,
    );
  });

  it('filters by class and lists branch findings before accuracy findings on every page', async () => {
    const branch = (await kwame.get(`/api/failures?run=${runId}&class=branch&limit=500`)).body.failures;
    expect(branch).toHaveLength(40);
    expect(new Set(branch.map((f: { findingClass: string }) => f.findingClass))).toEqual(new Set(['branch']));
    expect((await kwame.get(`/api/failures?run=${runId}&class=accuracy&limit=500`)).body.failures).toHaveLength(80);
    for (const sort of ['id', 'ulps']) {
      const classes: string[] = [];
      let after: string | null = null;
      do {
        const page: { body: { failures: { findingClass: string }[]; next: string | null } } = await kwame.get(
          `/api/failures?run=${runId}&sort=${sort}&limit=17${after ? `&after=${after}` : ''}`,
        );
        classes.push(...page.body.failures.map((f) => f.findingClass));
        after = page.body.next;
      } while (after);
      expect(classes).toEqual([...Array(40).fill('branch'), ...Array(80).fill('accuracy')]);
    }
  });

  it('opens newest first within each class, across keyed pages', async () => {
    const rows: { id: string; findingClass: string }[] = [];
    let after: string | null = null;
    do {
      const page: { body: { failures: { id: string; findingClass: string }[]; next: string | null } } = await kwame.get(
        `/api/failures?run=${runId}&limit=17${after ? `&after=${after}` : ''}`,
      );
      rows.push(...page.body.failures);
      after = page.body.next;
    } while (after);
    expect(rows).toHaveLength(120);
    for (const findingClass of ['branch', 'accuracy']) {
      const ids = rows.filter((f) => f.findingClass === findingClass).map((f) => Number(f.id));
      expect(ids).toEqual([...ids].sort((a, b) => b - a));
    }
  });

  it('lists equal errors newest first when sorted by ulps, across keyed pages', async () => {
    const rows: { id: string; findingClass: string; ulps: number | null }[] = [];
    let after: string | null = null;
    do {
      const page: { body: { failures: typeof rows; next: string | null } } = await kwame.get(
        `/api/failures?run=${runId}&sort=ulps&limit=17${after ? `&after=${after}` : ''}`,
      );
      rows.push(...page.body.failures);
      after = page.body.next;
    } while (after);
    expect(rows).toHaveLength(120);
    const ties = new Map<string, number[]>();
    for (const f of rows) {
      const key = `${f.findingClass} ${f.ulps ?? 0}`;
      ties.set(key, [...(ties.get(key) ?? []), Number(f.id)]);
    }
    // Branch findings carry no ulps, so all 40 tie at 0: the case the order must settle.
    expect(ties.get('branch 0')).toHaveLength(40);
    for (const ids of ties.values()) expect(ids).toEqual([...ids].sort((a, b) => b - a));
  });

  it('answers every page with the rows and cursor the row reader gives, key for key', async () => {
    const queries = [
      { limit: 50 },
      { limit: 50, after: '30:0' },
      { limit: 50, after: '31:1' },
      { limit: 7, class: 'branch' as const },
      { limit: 7, diagnosis: 'zero-sign' as const },
      { limit: 25, sort: 'ulps' as const },
      { limit: 25, sort: 'ulps' as const, after: '100:1:100' },
      { limit: 25, sort: 'ulps' as const, after: '99:0:0' },
      { limit: 500, status: 'new' as const },
      { limit: 500, status: 'accepted' as const },
    ];
    for (const q of queries) {
      const query = { sort: 'id' as const, run: runId, ...q };
      const { rows, next } = await searchFailures(t.db.dataSource, query);
      expect(JSON.parse(await failurePageJson(t.db.dataSource, query))).toEqual(
        JSON.parse(JSON.stringify({ failures: rows, next, decisions: {} })),
      );
    }
  });

  it('answers null, as the row reader does, for an error measure that is not finite', async () => {
    const [shard] = await t.db.dataSource.query(`SELECT id FROM shards WHERE run_id = $1 LIMIT 1`, [runId]);
    const inserted: { id: string }[] = await t.db.dataSource.query(
      `INSERT INTO failures (run_id, shard_id, suite_slug, suite_version, target_name, target_library, target_version, convention, path_name, point_index, t, z, z_hex, point_key, outcome_kind, diagnosis_kind, diagnosis, ulps, relative_error, rule, reproducer)
       VALUES ($1, $2, 'non-finite', 1, 'complex.js@2.4.3', 'complex.js', '2.4.3', 'signed-zero', 'p', 0, 0, '{"re":"1","im":"0"}', '{"re":"0x1p+0","im":"0x0p+0"}', 'nf0', 'fail', 'inaccurate', '{"kind":"inaccurate"}', 'Infinity', 'NaN', 'r', 'x'),
              ($1, $2, 'non-finite', 1, 'complex.js@2.4.3', 'complex.js', '2.4.3', 'signed-zero', 'p', 1, 1, '{"re":"1","im":"0"}', '{"re":"0x1p+0","im":"0x0p+0"}', 'nf1', 'fail', 'inaccurate', '{"kind":"inaccurate"}', '-Infinity', 'Infinity', 'r', 'x')
       RETURNING id`,
      [runId, shard.id],
    );
    try {
      for (const sort of ['id', 'ulps'] as const) {
        const query = { sort, run: runId, suite: 'non-finite', limit: 50 };
        const page = JSON.parse(await failurePageJson(t.db.dataSource, query));
        expect(page.failures.map((f: { ulps: unknown; relativeError: unknown }) => [f.ulps, f.relativeError])).toEqual([
          [null, null],
          [null, null],
        ]);
        const { rows, next } = await searchFailures(t.db.dataSource, query);
        expect(page).toEqual(JSON.parse(JSON.stringify({ failures: rows, next, decisions: {} })));
      }
    } finally {
      await t.db.dataSource.query(`DELETE FROM failures WHERE id = ANY($1)`, [inserted.map((r) => r.id)]);
    }
  });

  it('sorts by ulps, largest first, across pages', async () => {
    const first = (await kwame.get(`/api/failures?run=${runId}&class=accuracy&sort=ulps&limit=30`)).body;
    const second = (await kwame.get(`/api/failures?run=${runId}&class=accuracy&sort=ulps&limit=30&after=${first.next}`))
      .body;
    const ulps = [...first.failures, ...second.failures].map((f: { ulps: number }) => f.ulps);
    expect(ulps).toHaveLength(60);
    expect([...ulps].sort((a, b) => b - a)).toEqual(ulps);
    expect(new Set(ulps).size).toBe(60);
  });

  it('exports the filtered table as CSV with a header', async () => {
    const res = await kwame.get(`/api/failures/export.csv?run=${runId}&diagnosis=zero-sign`);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    const lines = res.text.trim().split('\n');
    expect(lines[0]).toBe(
      'run,suite,target,convention,path,t,z_re,z_im,z_hex_re,z_hex_im,expected_re,expected_im,actual_re,actual_im,outcome,diagnosis,ulps,relative_error,regression,labels,class,rule,first_left_step,choice',
    );
    expect(lines).toHaveLength(41);
    const cells = lines[1]!.split(',');
    expect(cells[0]).toBe(runId);
    expect(cells[1]).toMatch(/^[a-z0-9-]+@\d+$/);
    expect(cells.slice(14, 16)).toEqual(['fail', 'zero-sign']);
    expect(cells[18]).toMatch(/^(yes|no)$/);
    // Newest first: the points with a second label are not necessarily the first line.
    expect(lines.slice(1).map((line) => line.split(',').slice(19, 21))).toContainEqual([
      'zero-sign + inaccurate',
      'branch',
    ]);
  });

  it('shows one failure with the history of its point', async () => {
    const [first] = (await kwame.get(`/api/failures?run=${runId}&limit=1`)).body.failures;
    const res = await kwame.get(`/api/failures/${first.id}`);
    expect(res.body.failure).toMatchObject({ id: first.id, rule: 'ISO/IEC 9899:2011 G.6.4.2' });
    expect(res.body.history).toEqual([expect.objectContaining({ id: first.id, targetVersion: '2.4.3' })]);
  });

  it('names the bad filter', async () => {
    const res = await kwame.get(`/api/failures?diagnosis=wrong&limit=9999`);
    expect(res.status).toBe(400);
    expect(res.body.issues.map((i: { field: string }) => i.field).sort()).toEqual(['query.diagnosis', 'query.limit']);
    const bad = await kwame.get(`/api/failures?class=sheet&after=30`);
    expect(bad.status).toBe(400);
    expect(bad.body.issues).toEqual([
      { field: 'query.class', rule: 'must be one of branch, accuracy' },
      { field: 'query.after', rule: 'must be a cursor from a previous page' },
    ]);
  });

  it('cancels the run', async () => {
    expect((await kwame.post(`/api/runs/${runId}/cancel`)).body.run.status).toBe('cancelled');
    expect((await kwame.post(`/api/runs/${runId}/cancel`)).status).toBe(409);
  });
});

describe('verdicts on failures', () => {
  let t: TestApp;
  let runId: string;
  beforeAll(async () => {
    t = await startTestApp();
    await approvedSuite(t.db.dataSource, 'verdict-sqrt');
    const admin = await signInAs(t.app, 'admin');
    const target = (
      await t.db.dataSource.query(`SELECT name FROM targets WHERE library = 'complex.js' AND installed LIMIT 1`)
    )[0].name;
    const plan = await admin
      .post('/api/plans')
      .send({ name: 'verdict plan', recipients: [], suites: ['verdict-sqrt'], targets: [target] });
    runId = (await admin.post('/api/runs').send({ planId: plan.body.plan.id })).body.run.id;
    const [shard] = await t.db.dataSource.query(`SELECT id FROM shards WHERE run_id = $1`, [runId]);
    for (const [i, path] of ['a', 'a', 'b'].entries()) {
      await t.db.dataSource.query(
        `INSERT INTO failures (run_id, shard_id, suite_slug, suite_version, target_name, target_library, target_version, convention, path_name, point_index, t, z, z_hex, point_key, outcome_kind, diagnosis_kind, diagnosis, rule, reproducer)
         VALUES ($1, $2, 'verdict-sqrt', 1, 'complex.js@2.4.3', 'complex.js', '2.4.3', 'signed-zero', $3, $4, 0, '{"re":"-4","im":"-0"}', '{"re":"-0x1p+2","im":"-0x0p+0"}', $5, 'fail', 'zero-sign', '{"kind":"zero-sign","part":"im","of":"input"}', 'ISO/IEC 9899:2011 G.6.4.2', 'x')`,
        [runId, shard.id, path, i, `verdict-sqrt|${path}|${i}`],
      );
    }
  });
  afterAll(() => t.stop());

  it('accepts a deviation for a path until it expires, moving its failures from known to accepted', async () => {
    const hanne = await signInAs(t.app, 'reviewer');
    const first = (await hanne.get(`/api/failures?run=${runId}`)).body.failures.find(
      (f: { pathName: string }) => f.pathName === 'a',
    );
    const res = await hanne.post(`/api/failures/${first.id}/classify`).send({
      classification: 'accepted',
      scope: 'path',
      reason: 'complex.js documents that it ignores the sign of zero.',
      expiresAt: '2099-01-01T00:00:00Z',
    });
    expect(res.status).toBe(201);
    expect(
      (await hanne.get(`/api/failures?run=${runId}&status=accepted`)).body.failures.map(
        (f: { pathName: string }) => f.pathName,
      ),
    ).toEqual(['a', 'a']);
    expect(
      (await hanne.get(`/api/failures?run=${runId}&status=known`)).body.failures.map(
        (f: { pathName: string }) => f.pathName,
      ),
    ).toEqual(['b']);

    const revoked = await hanne.post(`/api/deviations/${res.body.deviation.id}/revoke`);
    expect(revoked.body.deviation.revokedAt).not.toBeNull();
    expect((await hanne.get(`/api/failures?run=${runId}&status=accepted`)).body.failures).toHaveLength(0);
  });

  it('needs an expiry in the future for an accepted deviation, and a reason', async () => {
    const hanne = await signInAs(t.app, 'reviewer');
    const [first] = (await hanne.get(`/api/failures?run=${runId}&limit=1`)).body.failures;
    const res = await hanne.post(`/api/failures/${first.id}/classify`).send({ classification: 'accepted', reason: '' });
    expect(res.status).toBe(400);
    expect(res.body.issues.map((i: { field: string }) => i.field).sort()).toEqual(['body.expiresAt', 'body.reason']);
    const past = await hanne
      .post(`/api/failures/${first.id}/classify`)
      .send({ classification: 'accepted', reason: 'old news', expiresAt: '2001-01-01T00:00:00Z' });
    expect(past.body.issues).toEqual([{ field: 'body.expiresAt', rule: 'must be a day after today (UTC)' }]);
  });

  it('records a bug verdict without an expiry', async () => {
    const hanne = await signInAs(t.app, 'reviewer');
    const [first] = (await hanne.get(`/api/failures?run=${runId}&limit=1`)).body.failures;
    const res = await hanne
      .post(`/api/failures/${first.id}/classify`)
      .send({ classification: 'bug', scope: 'point', reason: 'Reported upstream.' });
    expect(res.body.deviation).toMatchObject({ classification: 'bug', scope: 'point', expiresAt: null });
  });
});
