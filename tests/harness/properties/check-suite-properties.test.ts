import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { suiteSchema } from '../../../shared/schemas/suite-schema';
import { discoverTargets } from '../../../harness/adapters/discover-targets';
import { checkSuiteProperties } from '../../../harness/properties/check-suite-properties';
import { referenceTarget } from '../support/reference-target';

const DEMO = path.join(__dirname, '..', '..', '..', 'suites', 'demo');
const demo = (id: string) => suiteSchema.parse(JSON.parse(readFileSync(path.join(DEMO, `${id}.json`), 'utf8')));

describe('checkSuiteProperties', () => {
  it("holds every applicable property check of the demo catalogue on the reference's own values, with the demo's pinned seeds (first 100 runs each)", async () => {
    const failures: unknown[] = [];
    const notChecked: string[] = [];
    for (const file of readdirSync(DEMO).filter((f) => f.endsWith('.json'))) {
      const suite = suiteSchema.parse(JSON.parse(readFileSync(path.join(DEMO, file), 'utf8')));
      // The same seeds draw the same first points; 100 of the catalogue's 300 runs keep this file to a few seconds on 2 cores.
      const shorter = { ...suite, properties: suite.properties.map((p) => ({ ...p, runs: Math.min(p.runs, 100) })) };
      for (const outcome of await checkSuiteProperties(shorter, referenceTarget(suite.convention))) {
        if (outcome.kind === 'failed') failures.push(outcome);
        if (outcome.kind === 'not-checked') notChecked.push(`${suite.id}/${outcome.law}`);
      }
    }
    expect(failures).toEqual([]);
    // Every law the catalogue lists applies to its subject (the complex power lists none: (conj z)^w = conj(z^conj(w))).
    expect(notChecked.sort()).toEqual([]);
  }, 30_000);

  it("fails conjugate symmetry for complex.js 2.4.3's sqrt under signed-zero, on the cut (complex.js ignores the sign of a zero imaginary part in sqrt)", async () => {
    const descriptor = discoverTargets().find((d) => d.name === 'complex.js@2.4.3');
    if (!descriptor) throw new Error('complex.js 2.4.3 is a dependency of the project and must be installed');
    const [conjugate] = await checkSuiteProperties(demo('sqrt-principal-sz'), descriptor.open());
    expect(conjugate).toMatchObject({ kind: 'failed', law: 'conjugate-symmetry', seed: 1330520191 });
    if (conjugate?.kind !== 'failed') throw new Error('checked just above: the outcome is a failure');
    // The shrunk counterexample is x + i0 on the cut (seed 1330520191), so conj z = x − i0 carries the −0.
    expect(conjugate.counterexample[0]!.im).toBe('0');
    // ISO/IEC 9899:2011 G.6.4.2: csqrt(conj z) = conj csqrt(z), so csqrt(x − i0) = −i√|x| for x < 0;
    // complex.js answers +i√|x| on the left (f(conj z)) where conj f(z) on the right is −i√|x|.
    expect(conjugate.values.map((v) => Math.sign(Number(v.value.im)))).toEqual([1, -1]);
  });

  it("holds conjugate symmetry and the range for Python's cmath sqrt near its cut under signed-zero (cmath follows Annex G, common practice)", async () => {
    const descriptor = discoverTargets().find((d) => d.library === 'cmath');
    if (!descriptor) throw new Error('Debian python3 at /usr/bin/python3 runs the cmath target');
    const target = descriptor.open();
    try {
      const outcomes = await checkSuiteProperties(demo('sqrt-principal-sz'), target);
      expect(outcomes.filter((o) => o.law !== 'root-power').map((o) => o.kind)).toEqual(['held', 'held']);
    } finally {
      await target.close();
    }
  }, 20_000);
});
