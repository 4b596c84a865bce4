import { XMLParser, XMLValidator } from 'fast-xml-parser';
import { buildPlan } from '../../../../harness/runner/plan/build-plan';
import { formatJson } from '../../../../harness/runner/formats/format-json';
import { formatJunit } from '../../../../harness/runner/formats/format-junit';
import { formatTable } from '../../../../harness/runner/formats/format-table';
import { seededReferenceCache } from '../../../setup/seeded-reference-cache';
import { runPlan } from '../../../../harness/runner/plan/run-plan';
import { mutantTarget } from '../../../../harness/runner/evaluation/mutant-target';
import type { Target } from '../../../../harness/adapters/target';
import type { TargetDescriptor } from '../../../../harness/adapters/target-descriptor';
import { loadDemoSuite } from '../support/load-demo-suite';
import { referenceTarget } from '../support/reference-target';

const cache = seededReferenceCache();

const NASTY = 'a<b>&"c\'\u0001\u001b[31m';

describe('output formats', () => {
  let result: Awaited<ReturnType<typeof runPlan>>;
  beforeAll(async () => {
    // A target with a name no XML document can hold as it is, that answers NaN for one function and throws with control characters for another.
    const nasty: TargetDescriptor = {
      name: `oracle${NASTY}@1`,
      library: 'oracle',
      version: '1',
      settings: { note: NASTY },
      open: () =>
        referenceTarget(`oracle${NASTY}@1`, (op, _args, v) => {
          if (op === 'exp') return [NaN, v[1]];
          if (op === 'log') throw new Error(`log said ${NASTY}`);
          return v;
        }),
    };
    result = await runPlan(
      buildPlan(
        [loadDemoSuite('exp-principal-sz'), loadDemoSuite('log-principal-sz'), loadDemoSuite('sqrt-principal-sz')],
        [nasty],
      ),
      { cache },
    );
  });

  it('JUnit XML stays well-formed whatever the target says, and keeps the text', () => {
    const xml = formatJunit(result);
    expect(XMLValidator.validate(xml)).toBe(true);
    const doc = new XMLParser({ ignoreAttributes: false, attributeNamePrefix: '' }).parse(xml);
    const [exp, log, sqrt] = doc.testsuites.testsuite as {
      name: string;
      failures: string;
      errors: string;
      testcase: { failure?: unknown; error?: { message: string; '#text': string } }[];
    }[];
    expect(exp!.name).toBe('exp-principal-sz@1 × oraclea<b>&"c\'[31m@1');
    expect(exp!.failures).toBe('1');
    expect(log!.errors).toBe('3');
    expect(log!.testcase[0]!.error!['#text']).toContain('error: log: log said a<b>&"c\'[31m');
    expect(sqrt!.failures).toBe('0');
    expect(doc.testsuites.tests).toBe('7');
  });

  it('JSON writes a non-finite number as the wire strings and reads back as the same result otherwise', () => {
    const text = formatJson(result);
    const back = JSON.parse(text);
    expect(back.status).toBe('error');
    const notFinite = back.results[0].paths[0].findings[0];
    expect(notFinite.outcome).toEqual({
      kind: 'fail',
      diagnosis: { kind: 'not-finite' },
      labels: [{ kind: 'not-finite' }],
      ulps: 'inf',
      relativeError: 'inf',
    });
    expect(notFinite.actual.re).toBe('nan');
    expect(back.results[2]).toEqual(JSON.parse(JSON.stringify(result.results[2])));
  });

  it('JSON lists the branch labels of every byDiagnosis before inaccurate', () => {
    const back = JSON.parse(formatJson({ ...result, byDiagnosis: { inaccurate: 3, 'zero-sign': 1, 'cut-side': 2 } }));
    expect(Object.keys(back.byDiagnosis)).toEqual(['cut-side', 'zero-sign', 'inaccurate']);
  });

  it('the table names each pair, its counts and diagnoses, the first failures, and ends with the disclaimer', () => {
    const table = formatTable(result);
    expect(table).toContain('FAIL      exp-principal-sz v1 × oracle');
    expect(table).toContain('49 fail (49 branch, 0 accuracy) · 0 error · 0 skipped [branch: not-finite 49]');
    expect(table).toContain('ERROR     log-principal-sz v1');
    expect(table).toContain('PASS      sqrt-principal-sz v1');
    expect(table.trimEnd().endsWith(result.disclaimer)).toBe(true);
    // Each value is sign-exact text with one U+2212 minus per negative part (shared/format-complex-text.ts).
    const part = '(?:nan|inf|[0-9.]+(?:e[+-][0-9]+)?)';
    const values = [...table.matchAll(/(?:z =|expected|got) (\S+ [+−] \S+i)/g)].map((m) => m[1]);
    expect(values.some((v) => v!.startsWith('−'))).toBe(true);
    for (const v of values) expect(v).toMatch(new RegExp(`^−?${part} [+−] ${part}·?i$`));
  });

  it('reads an accuracy finding apart from a branch finding: JUnit failure type, table group, every label', async () => {
    // sqrt 1e-13 off above the real axis (right branch, an accuracy finding) and −√z below it
    // with a zero sign flipped on the axis (branch findings).
    const twoFaults: TargetDescriptor = {
      name: 'two-faults@1',
      library: 'two-faults',
      version: '1',
      settings: {},
      open: () =>
        referenceTarget('two-faults@1', (op, [z], v) =>
          op !== 'sqrt' ? v : z![1] > 0 ? [v[0] * (1 + 1e-13), v[1]] : z![1] < 0 ? [-v[0], -v[1]] : [v[0], -v[1]],
        ),
    };
    const twoFaultsResult = await runPlan(buildPlan([loadDemoSuite('sqrt-principal-sz')], [twoFaults]), { cache });
    const pair = twoFaultsResult.results[0]!;
    expect(pair.byClass.branch).toBeGreaterThan(0);
    expect(pair.byClass.accuracy).toBeGreaterThan(0);
    const doc = new XMLParser({ ignoreAttributes: false, attributeNamePrefix: '' }).parse(formatJunit(twoFaultsResult));
    const cases = doc.testsuites.testsuite.testcase as { name: string; failure?: { type: string; message: string } }[];
    const types = new Set(cases.filter((c) => c.failure).map((c) => c.failure!.type));
    expect([...types].every((t) => t === 'branch' || t === 'accuracy' || t === 'property')).toBe(true);
    expect(types.has('branch')).toBe(true);
    const table = formatTable(twoFaultsResult, 1000);
    const branchAt = table.indexOf('branch findings:');
    const accuracyAt = table.indexOf('accuracy findings:');
    expect(branchAt).toBeGreaterThan(0);
    expect(accuracyAt).toBeGreaterThan(branchAt);
    expect(table.slice(accuracyAt)).toMatch(/→ inaccurate, \d+ ulps in re, relative error/);
  });
});

describe('output formats for a composed subject and a choice', () => {
  it('the table and JUnit show each step beside the reference, the first to leave, and the choice behind an expected value', async () => {
    // Opened fresh for each pair, as a descriptor opens a library.
    const oracle = (open: () => Target): TargetDescriptor => {
      const { name, library, version, settings } = open();
      return { name, library, version, settings, open };
    };
    const viaExpLog = oracle(() => mutantTarget(referenceTarget('exp-log-pow@1'), 'inexact-intermediate'));
    // mpmath 1.3 answers acoth(0) = iπ/2; the reference pushes 1/0 through IEEE arithmetic: −iπ/2.
    const likeMpmath = oracle(() =>
      referenceTarget('like-mpmath@1', (op, [z], v) =>
        op === 'acoth' && z![0] === 0 && z![1] === 0 ? [0, Math.PI / 2] : v,
      ),
    );
    const steps = await runPlan(buildPlan([loadDemoSuite('log-of-a-power-principal-steps')], [viaExpLog]), { cache });
    const choice = await runPlan(buildPlan([loadDemoSuite('acoth-principal-sz')], [likeMpmath]), { cache });
    const stepLine =
      'steps: 1. pow(z, 13) = −1 − 1.9606728399089416e-15i (reference −1 + 0i), the first step to leave the reference; 2. log(pow(z, 13))';
    expect(formatTable(steps, 100)).toContain(stepLine);
    expect(formatJunit(steps)).toContain(stepLine.replace(/−/g, '-'));
    expect(formatTable(choice, 100)).toContain(
      'expected value is a choice: acoth z = atanh(1/z) is defined for z ≠ 0 only',
    );
    expect(formatJunit(choice)).toContain('choice   : a choice: acoth z = atanh(1/z)');
  });
});
