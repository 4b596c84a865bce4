import { readdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { suiteSchema, type Suite } from '../../shared/schemas/suite-schema';
import { outcomeLabels } from '../../shared/outcome-labels';
import {
  buildPath,
  discoverTargets,
  evaluateProgram,
  evaluateSuite,
  formatHexDouble,
  parseSubject,
  pathInputs,
  ReferenceCache,
  subjectProgram,
  suiteCacheKey,
  suiteExpectation,
  toPathSpec,
} from '../../harness';
import { seededRandom } from '../../tests/external/seeded-random';
import { callOf } from './call-of';
import { independentValues } from './independent-values';
import { independentVerdict, type AuditPoint, type IndependentValue } from './independent-verdict';

/** A regular branch for mpmath's side: g as written, ν, z0, f0 or k, and the cuts' polylines. */
function regularOf(branch: Extract<Suite['branch'], { kind: 'regular' }>): Omit<AuditPoint, 'z' | 'convention'> {
  const pair = (c: { re: string; im: string }): [string, string] => [c.re, c.im];
  return {
    fn: 'regular',
    cuts: [],
    inner: null,
    regular: {
      g: branch.g,
      nu: typeof branch.nu === 'string' ? [branch.nu, '0'] : pair(branch.nu),
      z0: pair(branch.z0),
      ...(branch.f0 ? { f0: pair(branch.f0) } : { k: branch.k ?? 0 }),
      cuts: branch.cuts.map((c) => ({ points: c.points.map(pair), to_infinity: c.to_infinity })),
    },
  };
}

function parseArgs(argv: string[]): {
  target: string;
  suites: string;
  sample: number;
  seed: number;
  out: string | null;
} {
  const get = (flag: string) => {
    const i = argv.indexOf(flag);
    return i >= 0 ? argv[i + 1] : undefined;
  };
  return {
    target: get('--target') ?? 'complex.js@2.4.3',
    suites: get('--suites') ?? 'suites/demo',
    sample: Number(get('--sample') ?? 200),
    seed: Number(get('--seed') ?? 20261205),
    out: get('--out') ?? null,
  };
}

/**
 * The verdict audit: runs every suite of a folder against one target, draws a seeded sample of
 * passing and failing points, recomputes each expected value with mpmath alone
 * (scripts/verdict-audit/independent_values.py: principal values as one-sided limits, regular
 * branches continued from z0 along two paths that avoid the cuts) and judges the library's value
 * again with the suite's tolerance and convention (independent-verdict.ts). A pass that mpmath
 * fails is a false pass; a failure that mpmath passes is a false fail.
 *
 *   node --import tsx scripts/verdict-audit/audit-verdicts.ts [--target complex.js@2.4.3] [--suites suites/demo] [--sample 200] [--seed N] [--out file.json]
 */
async function main(): Promise<void> {
  const args = parseArgs(process.argv.slice(2));
  const descriptor = discoverTargets().find((d) => d.name === args.target);
  if (!descriptor) throw new Error(`no installed target "${args.target}"`);
  const target = descriptor.open();
  const files = readdirSync(args.suites)
    .filter((f) => f.endsWith('.json'))
    .sort();
  const passes: AuditPoint[] = [];
  const fails: AuditPoint[] = [];
  const leftOut: string[] = [];
  const cache = new ReferenceCache(null);
  for (const file of files) {
    const suite: Suite = suiteSchema.parse(JSON.parse(readFileSync(path.join(args.suites, file), 'utf8')));
    const expr = parseSubject(suite.subject);
    const call = suite.branch.kind === 'principal' ? callOf(expr) : regularOf(suite.branch);
    if (!call) {
      leftOut.push(suite.id);
      continue;
    }
    const result = await evaluateSuite(suite, target, { cache, maxFindings: 1_000_000 });
    const expectation = suiteExpectation(suite, expr, cache, suiteCacheKey(suite));
    const program = subjectProgram(expr);
    for (const [k, spec] of suite.paths.entries()) {
      const pathResult = result.paths[k];
      if (!pathResult || pathResult.error) continue;
      const points = buildPath(toPathSpec(spec));
      const expected = expectation.expected(spec, points);
      const inputs = pathInputs(points);
      const actual = await evaluateProgram(program, target, inputs.re, inputs.im);
      const failing = new Map(pathResult.findings.map((f) => [f.index, f]));
      for (let i = 0; i < points.length; i++) {
        if (expected.skipped.has(i) || actual.errors.has(i)) continue;
        const finding = failing.get(i);
        if (finding && finding.outcome.kind !== 'fail') continue;
        // A point failed only by disagreeing with a counterpart is a verdict on the other value, not this one.
        if (finding && outcomeLabels(finding.outcome).every((d) => d.kind === 'disagreement')) continue;
        const point: AuditPoint = {
          ...call,
          suite: suite.id,
          path: spec.name,
          index: i,
          convention: suite.convention,
          // A regular branch fixes values, not the signs of zero parts (the harness's regular expectation agrees).
          zeroSigns: suite.branch.kind === 'principal' && suite.convention === 'signed-zero',
          tolerance: suite.tolerances.values,
          z: [formatHexDouble(inputs.re[i] as number), formatHexDouble(inputs.im[i] as number)],
          actual: [formatHexDouble(actual.re[i] as number), formatHexDouble(actual.im[i] as number)],
          harness: finding ? 'fail' : 'pass',
          labels: finding ? outcomeLabels(finding.outcome).map((d) => d.kind) : [],
        };
        (finding ? fails : passes).push(point);
      }
    }
  }
  await target.close();
  const random = seededRandom(args.seed);
  const draw = (from: AuditPoint[], n: number): AuditPoint[] => {
    const pool = [...from];
    const out: AuditPoint[] = [];
    while (out.length < n && pool.length > 0)
      out.push(pool.splice(Math.floor(random() * pool.length), 1)[0] as AuditPoint);
    return out;
  };
  // Drawn with spares: a point mpmath gives no value at (a pole, or 0 of acsc where conventions
  // disagree) is counted as unchecked and the next drawn point takes its place.
  const spare = Math.ceil(args.sample / 4);
  const sample = [...draw(passes, args.sample + spare), ...draw(fails, args.sample + spare)];
  const values = independentValues(sample);
  const judged = sample.map((p, k) => ({
    point: p,
    mpmath: values[k] as IndependentValue,
    verdict: independentVerdict(p, values[k] as IndependentValue),
  }));
  const unchecked = judged.filter((j) => j.verdict === 'unchecked');
  const kept = (side: 'pass' | 'fail') =>
    judged.filter((j) => j.point.harness === side && j.verdict !== 'unchecked').slice(0, args.sample);
  const checked = [...kept('pass'), ...kept('fail')];
  const falsePasses = checked.filter((j) => j.point.harness === 'pass' && j.verdict === 'fail');
  const falseFails = checked.filter((j) => j.point.harness === 'fail' && j.verdict === 'pass');
  const summary = {
    target: args.target,
    seed: args.seed,
    suitesLeftOut: leftOut,
    population: { passes: passes.length, failures: fails.length },
    checked: { passes: kept('pass').length, failures: kept('fail').length },
    uncheckedAmongDrawn: unchecked.length,
    falsePasses: falsePasses.length,
    falseFails: falseFails.length,
  };
  console.log(JSON.stringify(summary, null, 2));
  for (const j of [...falsePasses, ...falseFails, ...unchecked].slice(0, 20))
    console.log(JSON.stringify({ ...j.point, mpmath: j.mpmath, verdict: j.verdict }));
  if (args.out) writeFileSync(args.out, JSON.stringify({ summary, checked, unchecked }, null, 1));
}

void main();
