import type request from 'supertest';
import type { ConventionFingerprint } from '../../../shared/convention-fingerprint';
import type { CutMap } from '../../../shared/cut-map';
import type { VersionMatrix } from '../../../shared/version-matrix';
import { approvedSuite } from '../../setup/approved-suite';
import { signInAs } from '../../setup/sign-in-as';
import { startTestApp, type TestApp } from '../../setup/test-app';

let t: TestApp;
let reader: request.Agent;
const at = (name: string) => `/api/targets/${encodeURIComponent(name)}`;

beforeAll(async () => {
  t = await startTestApp();
  // The least powerful role: every signed-in role may read these.
  reader = await signInAs(t.app, 'contributor');
  await approvedSuite(t.db.dataSource, 'lib-sqrt', 'sqrt-principal-sz');
}, 60_000);
afterAll(() => t.stop());

describe('GET /api/targets', () => {
  it('lists each installed target’s entries, its default first', async () => {
    const res = await reader.get('/api/targets');
    expect(res.status).toBe(200);
    const byName = new Map(
      (res.body.targets as { name: string; entries?: { name: string; default: boolean }[] }[]).map((x) => [x.name, x]),
    );
    expect(byName.get('complex.js@2.4.1')?.entries?.map((e) => e.name)).toEqual([
      'complex',
      'object',
      'array',
      'string',
    ]);
    expect(byName.get('mathjs@15.2.0/number')?.entries?.[0]).toMatchObject({ name: 'number', default: true });
  });

  it('gives the convention a target states on its cuts, and none for a library that states none', async () => {
    const res = await reader.get('/api/targets');
    const targets = res.body.targets as { name: string; library: string; convention?: string }[];
    const cmath = targets.find((x) => x.library === 'cmath');
    // Python's cmath documents that the sign of a zero picks the side of a cut (from memory); the adapter states it.
    if (cmath) expect(cmath.convention).toBe('signed-zero');
    expect(targets.find((x) => x.name === 'complex.js@2.4.1')?.convention).toBeUndefined();
  });
});

describe('GET /api/targets/:name/fingerprint', () => {
  it('says cmath follows Annex G on every cut it has, with the +0 and −0 values at each place', async () => {
    const res = await reader.get(`${at('cmath@3.11.2')}/fingerprint`);
    expect(res.status).toBe(200);
    const fp = res.body.fingerprint as ConventionFingerprint;
    expect(fp.target).toBe('cmath@3.11.2');
    expect(fp.missing).toEqual(expect.arrayContaining(['cbrt', 'acot']));
    expect(fp.cuts.length).toBeGreaterThan(10);
    for (const cut of fp.cuts) {
      expect(cut.behaviour).toBe('signed-zero');
      expect(cut.probes.length).toBeGreaterThan(0);
    }
    const sqrt = fp.cuts.find((c) => c.function === 'sqrt')!;
    expect(sqrt.cut).toBe('(-inf, 0]');
    // sqrt(-0.5 + 0i) = +0.707…i and sqrt(-0.5 − 0i) = −0.707…i: the sign of the zero picks the side.
    const half = sqrt.probes.find((p) => p.at.re === '-0.5')!;
    expect(half.plusZero!.re).toBe('0');
    expect(Number(half.plusZero!.im)).toBeCloseTo(Math.SQRT1_2, 15);
    expect(Number(half.minusZero!.im)).toBeCloseTo(-Math.SQRT1_2, 15);
    expect(fp.statement).toMatch(/not a certification/);
  });

  it('finds complex.js 2.4.3 closing √ counter-clockwise while its log follows the zero sign, and says they disagree', async () => {
    const res = await reader.get(`${at('complex.js@2.4.3')}/fingerprint`).query({ fn: 'sqrt,log' });
    expect(res.status).toBe(200);
    const fp = res.body.fingerprint as ConventionFingerprint;
    expect(fp.cuts.map((c) => c.function)).toEqual(['sqrt', 'log']);
    const [sqrt, log] = fp.cuts;
    expect(sqrt).toMatchObject({ alone: 'counter-clockwise', behaviour: 'inconsistent', disagreesWith: ['log'] });
    expect(log).toMatchObject({ alone: 'signed-zero', behaviour: 'inconsistent', disagreesWith: ['sqrt'] });
    // The app's "disagrees with" line leads to a point where the two part ways: at −0.5 − 0i complex.js's
    // sqrt gives +0.707…i (counter-clockwise) and its log ln 0.5 − iπ (ISO/IEC 9899:2011 G.6.3.2).
    expect(sqrt!.disagreements).toEqual([
      expect.objectContaining({
        with: 'log',
        at: { re: '-0.5', im: '0' },
        sides: [
          expect.objectContaining({ function: 'sqrt', at: { re: '-0.5', im: '-0' }, follows: 'counter-clockwise' }),
          expect.objectContaining({ function: 'log', follows: 'signed-zero' }),
        ],
      }),
    ]);
  });

  it('reaches a target whose name has a slash when the name is percent-encoded', async () => {
    const res = await reader.get(`${at('mathjs@15.2.0/complex')}/fingerprint`).query({ fn: 'sqrt' });
    expect(res.status).toBe(200);
    expect(res.body.fingerprint.target).toBe('mathjs@15.2.0/complex');
  }, 30_000);

  it('keeps the answer: a second request is served from memory and says so', async () => {
    const first = await reader.get(`${at('complex.js@2.1.1')}/fingerprint`).query({ fn: 'asin,acos' });
    const started = performance.now();
    const second = await reader.get(`${at('complex.js@2.1.1')}/fingerprint`).query({ fn: 'asin,acos' });
    const elapsed = performance.now() - started;
    expect(first.body.fromCache).toBe(false);
    expect(second.body.fromCache).toBe(true);
    expect(second.body.fingerprint).toEqual(first.body.fingerprint);
    expect(second.body.computedMs).toBe(first.body.computedMs);
    expect(elapsed).toBeLessThan(300);
  });

  it('names the field of an unknown function', async () => {
    const res = await reader.get(`${at('complex.js@2.4.3')}/fingerprint`).query({ fn: 'sqrt,gamma' });
    expect(res.status).toBe(400);
    expect(res.body.kind).toBe('invalid-input');
    expect(res.body.issues).toEqual([{ field: 'query.fn', rule: expect.stringContaining('"gamma"') }]);
  });

  it('names an unknown query parameter', async () => {
    const res = await reader.get(`${at('complex.js@2.4.3')}/fingerprint`).query({ format: 'svg' });
    expect(res.status).toBe(400);
    expect(res.body.issues).toEqual([{ field: 'query', rule: 'has unknown parameters: format' }]);
  });

  it('builds values through the entry asked for, and names the field of an entry the target lacks', async () => {
    const byDefault = await reader.get(`${at('complex.js@2.4.1')}/fingerprint`).query({ fn: 'log' });
    expect(byDefault.status).toBe(200);
    // 2.4.1's constructor turns −0 into +0, so both zero signs land above log's cut.
    expect(byDefault.body.fingerprint).toMatchObject({ entry: 'complex', cuts: [{ behaviour: 'counter-clockwise' }] });
    const viaObject = await reader.get(`${at('complex.js@2.4.2')}/fingerprint`).query({ fn: 'log', entry: 'object' });
    expect(viaObject.body.fingerprint).toMatchObject({ entry: 'object', cuts: [{ behaviour: 'signed-zero' }] });
    const lacking = await reader.get(`${at('complex.js@2.4.2')}/fingerprint`).query({ fn: 'log', entry: 'parser' });
    expect(lacking.status).toBe(400);
    expect(lacking.body.issues).toEqual([
      {
        field: 'query.entry',
        rule: 'complex.js@2.4.2 has no entry "parser"; its entries are complex, object, array, string',
      },
    ]);
    const malformed = await reader.get(`${at('complex.js@2.4.2')}/fingerprint`).query({ entry: 'Pars\u0000er' });
    expect(malformed.status).toBe(400);
    expect(malformed.body.issues[0].field).toBe('query.entry');
  });

  it('answers 404 for a target that is not installed', async () => {
    const res = await reader.get(`${at('complex.js@9.9.9')}/fingerprint`);
    expect(res.status).toBe(404);
    expect(res.body.kind).toBe('not-found');
  });
});

describe('GET /api/targets/:name/cut-map', () => {
  it("matches sqrt's one cut on cmath over the default box and grid", async () => {
    const res = await reader.get(`${at('cmath@3.11.2')}/cut-map`).query({ fn: 'sqrt' });
    expect(res.status).toBe(200);
    const map = res.body.cutMap as CutMap;
    expect(map).toMatchObject({ target: 'cmath@3.11.2', function: 'sqrt', columns: 81, rows: 81, verdict: 'matches' });
    expect(map.box).toEqual({ min: { re: '-4', im: '-4' }, max: { re: '4', im: '4' } });
    expect(map.expected).toEqual([
      { label: '(-inf, 0]', from: { re: '0', im: '0' }, to: { re: '-4', im: '0' }, coverage: 1, seen: true },
    ]);
    expect(map.observed.length).toBeGreaterThan(0);
    for (const segment of map.observed) {
      expect(segment.onExpectedCut).toBe(true);
      for (const p of segment.points) expect(Number(p.im)).toBeCloseTo(0, 6);
    }
  });

  it("finds complex.js 2.4.3's acot discontinuous off its expected cut", async () => {
    const res = await reader
      .get(`${at('complex.js@2.4.3')}/cut-map`)
      .query({ fn: 'acot', box: '-2,-2,2,2', grid: '41x41' });
    expect(res.status).toBe(200);
    const map = res.body.cutMap as CutMap;
    expect(map.verdict).toBe('differs');
    expect(map.observed.some((o) => !o.onExpectedCut)).toBe(true);
    expect(map.columns).toBe(41);
  });

  it('refuses a grid beyond 201×201 and a box beyond ±1000, naming both fields', async () => {
    const res = await reader
      .get(`${at('complex.js@2.4.3')}/cut-map`)
      .query({ fn: 'sqrt', grid: '401x401', box: '-5000,-1,1,1' });
    expect(res.status).toBe(400);
    expect(res.body.issues).toEqual(
      expect.arrayContaining([
        { field: 'query.grid', rule: 'allows at most 201 columns and rows on the server' },
        { field: 'query.box', rule: 'needs every coordinate between -1000 and 1000' },
      ]),
    );
  });

  it('refuses a box that is not four numbers and a missing function', async () => {
    const res = await reader.get(`${at('complex.js@2.4.3')}/cut-map`).query({ box: '1,2,3' });
    expect(res.status).toBe(400);
    expect(res.body.issues.map((i: { field: string }) => i.field).sort()).toEqual(['query.box', 'query.fn']);
  });

  it('says which function a target lacks', async () => {
    const res = await reader.get(`${at('cmath@3.11.2')}/cut-map`).query({ fn: 'acot', grid: '5x5' });
    expect(res.status).toBe(400);
    expect(res.body.issues).toEqual([{ field: 'query.fn', rule: 'is not a function cmath@3.11.2 has (no acot)' }]);
  });

  it('accepts the largest grid allowed and refuses one column more', async () => {
    const over = await reader.get(`${at('complex.js@2.4.3')}/cut-map`).query({ fn: 'asin', grid: '202x201' });
    expect(over.status).toBe(400);
    expect(over.body.issues).toEqual([
      { field: 'query.grid', rule: 'allows at most 201 columns and rows on the server' },
    ]);
    const largest = await reader.get(`${at('complex.js@2.4.3')}/cut-map`).query({ fn: 'asin', grid: '201x201' });
    expect(largest.status).toBe(200);
    expect(largest.body.cutMap).toMatchObject({ columns: 201, rows: 201, verdict: 'matches' });
  }, 30_000);
});

describe('GET /api/targets/:name/version-matrix', () => {
  it('shows every installed complex.js version and the points whose √ changed between them', async () => {
    const res = await reader.get('/api/targets/complex.js/version-matrix').query({ suite: 'lib-sqrt' });
    expect(res.status).toBe(200);
    const matrix = res.body.matrix as VersionMatrix;
    expect(matrix.library).toBe('complex.js');
    expect(matrix.versions).toEqual(['2.0.11', '2.1.1', '2.2.5', '2.3.0', '2.4.1', '2.4.2', '2.4.3']);
    const [suite] = matrix.suites;
    expect(suite!.id).toBe('lib-sqrt');
    expect(suite!.statusByVersion.map((s) => s.version)).toEqual(matrix.versions);
    expect(suite!.changes.length).toBeGreaterThan(0);
    for (const change of suite!.changes) {
      expect(matrix.versions.slice(1)).toContain(change.firstChangedIn);
      expect(change.steps[0]!.after.version).toBe(change.firstChangedIn);
      expect(change.steps[0]!.before.value).not.toEqual(change.steps[0]!.after.value);
    }
  }, 30_000);

  it('compares at each entry asked for, and names the field of an entry a version lacks', async () => {
    const res = await reader
      .get('/api/targets/complex.js/version-matrix')
      .query({ suite: 'lib-sqrt', entry: 'complex,string' });
    expect(res.status).toBe(200);
    expect((res.body.matrix as VersionMatrix).suites.map((s) => [s.id, s.entry])).toEqual([
      ['lib-sqrt', 'complex'],
      ['lib-sqrt', 'string'],
    ]);
    const lacking = await reader
      .get('/api/targets/complex.js/version-matrix')
      .query({ suite: 'lib-sqrt', entry: 'parser' });
    expect(lacking.status).toBe(400);
    expect(lacking.body.issues[0]).toEqual({
      field: 'query.entry',
      rule: expect.stringContaining('no entry "parser"'),
    });
  }, 30_000);

  it('refuses more than eight suites at once', async () => {
    const nine = ['a', 'b', 'c', 'd', 'e', 'f', 'g', 'h', 'i'].map((x) => `${x}-suite`).join(',');
    const res = await reader.get('/api/targets/complex.js/version-matrix').query({ suite: nine });
    expect(res.status).toBe(400);
    expect(res.body.issues).toEqual([{ field: 'query.suite', rule: 'names more than 8 suites; ask in groups' }]);
  });

  it('names the suites that have no approved version', async () => {
    const res = await reader.get('/api/targets/complex.js/version-matrix').query({ suite: 'lib-sqrt,no-such-suite' });
    expect(res.status).toBe(400);
    expect(res.body.issues).toEqual([{ field: 'query.suite', rule: 'has no approved version: no-such-suite' }]);
  });

  it('requires the suites', async () => {
    const res = await reader.get('/api/targets/complex.js/version-matrix');
    expect(res.status).toBe(400);
    expect(res.body.issues[0].field).toBe('query.suite');
  });

  it('answers 409 for a library with one installed version and 404 for an unknown one', async () => {
    const one = await reader.get('/api/targets/cmath/version-matrix').query({ suite: 'lib-sqrt' });
    expect(one.status).toBe(409);
    expect(one.body.message).toMatch(/one installed version/);
    const none = await reader.get('/api/targets/nothing-here/version-matrix').query({ suite: 'lib-sqrt' });
    expect(none.status).toBe(404);
  });
});
