import { XMLParser } from 'fast-xml-parser';
import type { TargetDescriptor } from '../../../../harness/adapters/target-descriptor';
import { formatJson } from '../../../../harness/runner/formats/format-json';
import { formatJunit } from '../../../../harness/runner/formats/format-junit';
import { formatTable } from '../../../../harness/runner/formats/format-table';
import { buildPlan } from '../../../../harness/runner/plan/build-plan';
import { runPlan } from '../../../../harness/runner/plan/run-plan';
import type { PropertyOutcome } from '../../../../shared/property-outcome';
import { seededReferenceCache } from '../../../setup/seeded-reference-cache';
import { loadDemoSuite } from '../support/load-demo-suite';
import { referenceTarget } from '../support/reference-target';

const cache = seededReferenceCache();

describe('a failed property check in the outputs', () => {
  let result: Awaited<ReturnType<typeof runPlan>>;
  let failed: Extract<PropertyOutcome, { kind: 'failed' }>;
  beforeAll(async () => {
    // ISO/IEC 9899:2011 G.6.4.2: csqrt(conj(z)) = conj(csqrt(z)). This sqrt answers x − 0i as if it were x + 0i.
    const ignoresMinusZero: TargetDescriptor = {
      name: 'drops-minus-zero@1',
      library: 'drops-minus-zero',
      version: '1',
      settings: {},
      open: () =>
        referenceTarget('drops-minus-zero@1', (op, [z], v) =>
          op === 'sqrt' && z![0] < 0 && Object.is(z![1], -0) ? [v[0], -v[1]] : v,
        ),
    };
    // Only the law under test: the suite's other laws cost the reference engine seconds here.
    const demo = loadDemoSuite('sqrt-principal-sz');
    const suite = { ...demo, properties: demo.properties.filter((p) => p.law === 'conjugate-symmetry') };
    result = await runPlan(buildPlan([suite], [ignoresMinusZero]), {
      cache,
      properties: true,
    });
    const outcome = result.results[0]!.properties!.find((o) => o.law === 'conjugate-symmetry')!;
    if (outcome.kind !== 'failed') throw new Error(`expected conjugate symmetry to fail: ${JSON.stringify(outcome)}`);
    failed = outcome;
  });

  it('has a shrunk counterexample on the cut, the two sides of the law, a seed and a replay path', () => {
    expect(failed.counterexample).toHaveLength(1);
    expect(failed.sides).toEqual(['f(conj z)', 'conj f(z)']);
    expect(failed.values.map((v) => v.name)).toEqual(['f(conj z)', 'conj f(z)']);
    expect(failed.path).not.toBe('');
  });

  it('the table shows the counterexample, both sides with their values, the seed and the replay path', () => {
    const table = formatTable(result);
    const z = failed.counterexample[0]!;
    expect(table).toContain(`property FAILED: ${failed.title} — ${failed.reason}`);
    expect(table).toMatch(
      new RegExp(`counterexample \\(shrunk \\d+ times?, after \\d+ runs?\\): z = −${z.re.replace('-', '')} [+−] 0i`),
    );
    expect(table).toMatch(/left side\s+f\(conj z\) = \S+ [+−] \S+i/);
    expect(table).toMatch(/right side\s+conj f\(z\) = \S+ [+−] \S+i/);
    expect(table).toContain(`replay with fast-check: seed ${failed.seed}, path "${failed.path}"`);
  });

  it('the JUnit failure carries the same lines in ASCII, with the reason as its message', () => {
    const doc = new XMLParser({ ignoreAttributes: false, attributeNamePrefix: '' }).parse(formatJunit(result));
    const cases = doc.testsuites.testsuite.testcase as {
      name: string;
      failure?: { message: string; '#text': string };
    }[];
    const property = cases.find((c) => c.name.startsWith('conjugate-symmetry'))!;
    expect(property.failure!.message).toBe(failed.reason);
    const body = property.failure!['#text'];
    expect(body).toContain(`z = -${failed.counterexample[0]!.re.replace('-', '')}`);
    expect(body).toMatch(/left side\s+f\(conj z\) = /);
    expect(body).toMatch(/right side\s+conj f\(z\) = /);
    expect(body).toContain(`seed ${failed.seed}, path "${failed.path}"`);
    expect(body).not.toContain('−');
  });

  it('the JSON keeps the whole outcome, sides included', () => {
    const json = JSON.parse(formatJson(result)) as typeof result;
    expect(json.results[0]!.properties).toContainEqual(failed);
  });
});
