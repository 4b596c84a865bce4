import fc from 'fast-check';
import { checkSuiteSemantics } from '../../../harness/suites/check-suite-semantics';
import { demoCatalogue } from '../../../scripts/demo-catalogue/demo-catalogue';
import { validateSuite } from '../../../shared/validate-suite';
import { signInAs } from '../../setup/sign-in-as';
import { startTestApp, type TestApp } from '../../setup/test-app';

const SEED = 4_242_026;
type Json = null | boolean | number | string | Json[] | { [k: string]: Json };

/** Every place in a JSON value, as a list of keys. */
function places(value: Json, at: (string | number)[] = []): (string | number)[][] {
  const here = at.length > 0 ? [at] : [];
  if (Array.isArray(value)) return [...here, ...value.flatMap((v, i) => places(v, [...at, i]))];
  if (value && typeof value === 'object')
    return [...here, ...Object.entries(value).flatMap(([k, v]) => places(v, [...at, k]))];
  return here;
}

type Mutation =
  | { kind: 'delete' }
  | { kind: 'replace'; value: Json }
  | { kind: 'unknown-key'; key: string }
  | { kind: 'bad-number'; text: string };

function mutate(doc: Json, place: (string | number)[], m: Mutation): Json {
  const copy = JSON.parse(JSON.stringify(doc)) as Json;
  const parent = place
    .slice(0, -1)
    .reduce<Json>((node, key) => (node as Record<string | number, Json>)[key] as Json, copy) as Record<
    string | number,
    Json
  >;
  const key = place[place.length - 1]!;
  if (m.kind === 'delete') {
    if (Array.isArray(parent)) parent.splice(Number(key), 1);
    else delete parent[key];
  } else if (m.kind === 'replace') parent[key] = m.value;
  else if (m.kind === 'bad-number') parent[key] = m.text;
  else if (parent[key] && typeof parent[key] === 'object' && !Array.isArray(parent[key]))
    (parent[key] as Record<string, Json>)[m.key] = 1;
  else parent[key] = { [m.key]: 1 };
  return copy;
}

const catalogue = demoCatalogue() as unknown as Json[];
const mutation: fc.Arbitrary<Mutation> = fc.oneof(
  fc.constant({ kind: 'delete' as const }),
  fc.jsonValue({ maxDepth: 2 }).map((value) => ({ kind: 'replace' as const, value: value as Json })),
  fc.constantFrom('extra', 'Version', '__proto__x', 'sampels').map((key) => ({ kind: 'unknown-key' as const, key })),
  fc
    .constantFrom('1,5', '0x', '1e', '--1', 'pi/0', '', ' ', 'infinity and beyond', '1/0.5')
    .map((text) => ({ kind: 'bad-number' as const, text })),
);
const malformedSuite = fc
  .record({ suite: fc.nat({ max: catalogue.length - 1 }), place: fc.nat(), mutation })
  .map(({ suite, place, mutation: m }) => {
    const doc = catalogue[suite]!;
    const all = places(doc);
    return mutate(doc, all[place % all.length]!, m);
  })
  .filter((doc) => {
    const checked = validateSuite(doc, 'generated');
    return !checked.ok || checkSuiteSemantics(checked.suite).length > 0;
  });

describe('malformed suite files and uploads', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.stop());

  it(`answers 1,000 generated malformed suites (500 as bodies, 500 as uploads) with 4xx naming a field, and stores nothing (seed ${SEED})`, async () => {
    const agent = await signInAs(t.app, 'contributor');
    const samples = fc.sample(malformedSuite, { numRuns: 1000, seed: SEED });
    expect(samples).toHaveLength(1000);
    const wrong: { index: number; status: number; body: unknown }[] = [];
    for (const [index, doc] of samples.entries()) {
      const res =
        index % 2 === 0
          ? await agent.post('/api/suites').send(doc as object)
          : await agent.post('/api/suites/upload').attach('file', Buffer.from(JSON.stringify(doc)), 'generated.json');
      const fieldLevel =
        res.status === 400 &&
        Array.isArray(res.body.issues) &&
        res.body.issues.length > 0 &&
        res.body.issues.every(
          (i: { field: string; rule: string }) => /^(body|file)(\.|$)/.test(i.field) && i.rule.length > 0,
        );
      if (!fieldLevel) wrong.push({ index, status: res.status, body: res.body });
    }
    expect({ seed: SEED, wrong: wrong.slice(0, 5), count: wrong.length }).toEqual({ seed: SEED, wrong: [], count: 0 });
    const rows = await t.db.dataSource.query(
      `SELECT (SELECT count(*) FROM suites)::int AS suites, (SELECT count(*) FROM suite_versions)::int AS versions`,
    );
    expect(rows[0]).toEqual({ suites: 0, versions: 0 });
  }, 120_000);
});
