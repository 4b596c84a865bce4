import type { Diagnosis, DiagnosisKind } from '../../shared/diagnosis';
import type { PointOutcome } from '../../shared/point-outcome';
import type {
  MonodromyCheck,
  OutcomeCounts,
  PathResult,
  PointFinding,
  SuiteTargetResult,
} from '../../shared/run-result';
import type { WireComplex } from '../../shared/wire-complex';
import type { Suite } from '../../shared/schemas/suite-schema';
import type { SuitePath } from '../../shared/schemas/suite-path-schema';
import type { Tolerance } from '../../shared/schemas/tolerance-schema';
import type { ComplexPair } from '../adapters/complex-pair';
import type { Target } from '../adapters/target';
import { checkValue } from '../checks/check-value';
import type { ComplexDouble } from '../checks/complex-double';
import { detectJumpsInColumns } from '../checks/detect-jumps';
import { diagnoseFailure } from '../checks/diagnose-failure';
import { findMisplacedCuts } from '../checks/find-misplaced-cuts';
import { formatHexDouble } from '../checks/format-hex-double';
import { libraryMonodromy } from '../checks/library-monodromy';
import { relativeError } from '../checks/relative-error';
import { ulpsApart } from '../checks/ulps-apart';
import { worstPart } from '../checks/worst-part';
import { parseSubject } from '../expressions/parse-subject';
import { buildPath } from '../paths/build-path';
import type { PathPoint } from '../paths/path-point';
import { formatDouble } from '../reference/numbers/format-double';
import { evaluateProgram } from './evaluate-program';
import type { ExpectedColumn, Expectation } from './expectation';
import { principalExpectation } from './principal-expectation';
import { pairStatus } from './pair-status';
import { ReferenceCache } from './reference-cache';
import { regularExpectation } from './regular-expectation';
import { reproducer } from './reproducer';
import { subjectProgram, type SubjectProgram } from './subject-program';
import { suiteCacheKey } from './suite-cache-key';
import { toPathSpec } from './to-path-spec';

export interface EvaluateSuiteOptions {
  /** Reference values by point bits; without one, a private in-memory cache is used. */
  cache?: ReferenceCache;
  /** Stops between batches; the points not yet evaluated become errors with the abort reason. */
  signal?: AbortSignal;
  /** Evaluate only these paths (indices into suite.paths); all by default. */
  paths?: readonly number[];
  /** Failing points listed in full per path (all are counted); 200 by default. */
  maxFindings?: number;
  /** Called after each path with the number of points done so far in this call. */
  onProgress?: (done: number, total: number) => void;
}

/** The monodromy tolerance when a suite gives none: the factors are products of exactly known roots of unity. */
const DEFAULT_MONODROMY: Tolerance = { relative: 1e-12 };
const DEFAULT_MAX_FINDINGS = 200;
/** A failure this close to the expected value (relative) can only be inaccurate: see the check loop. */
const MERELY_INACCURATE = 1e-9;
const CONTINUOUS = new Set(['circle', 'segment', 'polyline']);
/** Points of each path object already built: a suite checked against several targets builds its paths once. */
const BUILT = new WeakMap<SuitePath, PathPoint[] | Error>();
/** The same points column-wise, with their t: the adapters and the check loop read these. */
const INPUTS = new WeakMap<PathPoint[], { re: Float64Array; im: Float64Array; t: number[] }>();

const wire = (v: ComplexDouble): WireComplex => ({ re: formatDouble(v[0]), im: formatDouble(v[1]) });
const emptyCounts = (): OutcomeCounts => ({ pass: 0, fail: 0, error: 0, skipped: 0 });
const errorText = (e: unknown): string => (e instanceof Error ? e.message : String(e));

/**
 * One suite against one target (docs/vocabulary.md, docs/architecture.md): every point of every path evaluated with
 * the library's own operations and compared sign-exactly with the expected value (principal:
 * the reference of the whole subject under the suite's convention; regular: the continued
 * branch on the cut plane); each failure diagnosed (zero-sign, cut-side, other-sheet,
 * inaccurate, not-finite, and along continuous paths misplaced-cut from the jumps of both);
 * closed paths of regular branches checked for their monodromy. Failures carry the input's
 * exact bits, both one-sided limits on a cut, the rule that fixes the expected value and a
 * reproducer. Property checks are not run here (runPlan's `properties` option does that).
 *
 * This is the API the cut map, fingerprint and version matrix build on; its signature is kept stable.
 */
export async function evaluateSuite(
  suite: Suite,
  target: Target,
  options: EvaluateSuiteOptions = {},
): Promise<SuiteTargetResult> {
  const started = Date.now();
  const cache = options.cache ?? new ReferenceCache(null);
  const computed0 = cache.computed;
  const cached0 = cache.cached;
  const selected = options.paths ?? suite.paths.map((_, i) => i);
  const maxFindings = options.maxFindings ?? DEFAULT_MAX_FINDINGS;
  const result: SuiteTargetResult = {
    suite: { id: suite.id, version: suite.version, title: suite.title, subject: suite.subject },
    target: { name: target.name, library: target.library, version: target.version, settings: target.settings },
    status: 'pass',
    checked: {
      convention: suite.convention,
      branch: suite.branch.kind,
      tolerance:
        'ulps' in suite.tolerances.values
          ? `${suite.tolerances.values.ulps} ulps per part`
          : `relative error ${suite.tolerances.values.relative}`,
      paths: selected.length,
      points: 0,
      properties: {
        listed: suite.properties.map((p) => p.law),
        run: false,
        note: suite.properties.length
          ? 'property checks are not run by evaluateSuite'
          : 'the suite lists no property checks',
      },
    },
    counts: emptyCounts(),
    byDiagnosis: {},
    paths: [],
    properties: null,
    errors: [],
    durationMs: 0,
    reference: { computed: 0, cached: 0 },
  };
  let program: SubjectProgram;
  let expectation: Expectation;
  let cacheKey = '';
  try {
    const expr = parseSubject(suite.subject);
    program = subjectProgram(expr);
    cacheKey = suiteCacheKey(suite);
    const key = cacheKey;
    expectation =
      suite.branch.kind === 'principal'
        ? principalExpectation(suite, expr, cache, key)
        : regularExpectation(suite, cache, key);
    result.checked.branch = expectation.description;
  } catch (e) {
    result.errors.push(`the suite cannot be evaluated: ${errorText(e)}`);
    result.status = 'error';
    result.durationMs = Date.now() - started;
    return result;
  }
  const unsupported: string[] = [];
  for (const op of program.ops) if (!(await target.supports(op))) unsupported.push(op);

  const paths = selected.map((i) => suite.paths[i] as SuitePath);
  const built = paths.map((path) => {
    const known = BUILT.get(path);
    if (known) return known;
    let points: PathPoint[] | Error;
    try {
      points = buildPath(toPathSpec(path));
    } catch (e) {
      points = e instanceof Error ? e : new Error(String(e));
    }
    BUILT.set(path, points);
    return points;
  });
  const total = built.reduce((s, b) => s + (Array.isArray(b) ? b.length : 0), 0);
  result.checked.points = total;
  let done = 0;
  for (let k = 0; k < paths.length; k++) {
    const path = paths[k] as SuitePath;
    const points = built[k] as PathPoint[] | Error;
    if (options.signal?.aborted) {
      // Stopped (cancelled or out of time): the remaining paths are not evaluated.
      const n = Array.isArray(points) ? points.length : 0;
      const reason =
        options.signal.reason instanceof Error
          ? options.signal.reason.message
          : String(options.signal.reason ?? 'cancelled');
      result.paths.push({
        name: path.name,
        kind: path.kind,
        points: n,
        counts: { pass: 0, fail: 0, error: 0, skipped: n },
        byDiagnosis: {},
        jumps: null,
        monodromy: null,
        findings: [],
        findingsOmitted: 0,
        skipped: [{ reason, count: n }],
      });
      continue;
    }
    const pathResult = await evaluatePath(
      suite,
      cache,
      cacheKey,
      target,
      program,
      expectation,
      path,
      points,
      unsupported,
      maxFindings,
      options.signal,
    );
    result.paths.push(pathResult);
    done += Array.isArray(points) ? points.length : 0;
    options.onProgress?.(done, total);
  }
  for (const p of result.paths) {
    for (const key of Object.keys(result.counts) as (keyof OutcomeCounts)[]) result.counts[key] += p.counts[key];
    if (p.error) result.errors.push(`${p.name}: ${p.error}`);
  }
  result.byDiagnosis = countDiagnoses(result.paths);
  const monodromyFailed = result.paths.some((p) => p.monodromy && !p.monodromy.pass);
  result.status = pairStatus(result.counts, result.errors, monodromyFailed, options.signal?.aborted === true);
  result.reference = { computed: cache.computed - computed0, cached: cache.cached - cached0 };
  result.durationMs = Date.now() - started;
  return result;
}

function countDiagnoses(paths: PathResult[]): Partial<Record<DiagnosisKind, number>> {
  const out: Partial<Record<DiagnosisKind, number>> = {};
  for (const p of paths)
    for (const [kind, n] of Object.entries(p.byDiagnosis))
      out[kind as DiagnosisKind] = (out[kind as DiagnosisKind] ?? 0) + (n ?? 0);
  return out;
}

async function evaluatePath(
  suite: Suite,
  cache: ReferenceCache,
  cacheKey: string,
  target: Target,
  program: SubjectProgram,
  expectation: Expectation,
  path: SuitePath,
  points: PathPoint[] | Error,
  unsupported: string[],
  maxFindings: number,
  signal: AbortSignal | undefined,
): Promise<PathResult> {
  const out: PathResult = {
    name: path.name,
    kind: path.kind,
    points: Array.isArray(points) ? points.length : 0,
    counts: emptyCounts(),
    jumps: null,
    monodromy: null,
    findings: [],
    findingsOmitted: 0,
    skipped: [],
    byDiagnosis: {},
  };
  if (points instanceof Error) {
    out.error = `the path cannot be built: ${points.message}`;
    return out;
  }
  const n = points.length;
  const skipReasons = new Map<string, number>();
  const skip = (reason: string, count = 1) => skipReasons.set(reason, (skipReasons.get(reason) ?? 0) + count);
  if (unsupported.length > 0) {
    out.counts.skipped = n;
    skip(`${target.name} has no ${unsupported.join(', ')}`, n);
    out.skipped = [...skipReasons].map(([reason, count]) => ({ reason, count }));
    return out;
  }
  let inputs = INPUTS.get(points);
  if (!inputs) {
    inputs = { re: new Float64Array(n), im: new Float64Array(n), t: new Array<number>(n) };
    for (let i = 0; i < n; i++) {
      inputs.re[i] = (points[i] as PathPoint).z.re;
      inputs.im[i] = (points[i] as PathPoint).z.im;
      inputs.t[i] = (points[i] as PathPoint).t;
    }
    INPUTS.set(points, inputs);
  }
  const { re, im } = inputs;
  let expected: ExpectedColumn;
  try {
    let byKey = cache.columns.get(points);
    if (!byKey) cache.columns.set(points, (byKey = new Map()));
    const known = byKey.get(cacheKey) as ExpectedColumn | undefined;
    if (known) {
      expected = known;
      cache.cached += n - known.skipped.size;
    } else {
      expected = expectation.expected(path, points);
      byKey.set(cacheKey, expected);
    }
  } catch (e) {
    out.error = `no expected values: ${errorText(e)}`;
    out.counts.error = n;
    return out;
  }
  const actual = await evaluateProgram(program, target, re, im, signal);

  // The check loop: identical bits pass at once; otherwise ulps (or relative error) in doubles; only failures get the full comparison.
  const tol = suite.tolerances.values;
  const tolUlps = 'ulps' in tol ? tol.ulps : -1;
  const tolRel = 'relative' in tol ? tol.relative : -1;
  const zeroSigns = expectation.zeroSigns;
  const outcomes: (PointOutcome | null)[] = new Array(n).fill(null);
  const failing: number[] = [];
  const errored: number[] = [];
  const ere = expected.re;
  const eim = expected.im;
  const are = actual.re;
  const aim = actual.im;
  const hasSkips = expected.skipped.size > 0;
  const hasErrors = actual.errors.size > 0;
  for (let i = 0; i < n; i++) {
    if (hasSkips && expected.skipped.has(i)) {
      skip(expected.skipped.get(i) as string);
      out.counts.skipped++;
      continue;
    }
    if (hasErrors && actual.errors.has(i)) {
      outcomes[i] = { kind: 'error', message: actual.errors.get(i) as string };
      out.counts.error++;
      errored.push(i);
      continue;
    }
    const ar = are[i] as number;
    const ai = aim[i] as number;
    const er = ere[i] as number;
    const ei = eim[i] as number;
    if (
      ar === er &&
      ai === ei &&
      (!zeroSigns || ((ar !== 0 || Object.is(ar, er)) && (ai !== 0 || Object.is(ai, ei))))
    ) {
      out.counts.pass++;
      continue;
    }
    if (
      ar - ar === 0 &&
      ai - ai === 0 &&
      er - er === 0 &&
      ei - ei === 0 &&
      !(zeroSigns && ((ar === 0 && er === 0 && !Object.is(ar, er)) || (ai === 0 && ei === 0 && !Object.is(ai, ei))))
    ) {
      // Finite, zero signs right: ulps without BigInt, and the outcome of a failure without checkValue.
      const u = Math.max(ulpsApart(ar, er), ulpsApart(ai, ei));
      const rel = tolUlps >= 0 && u <= tolUlps ? 0 : relativeError([ar, ai], [er, ei]);
      if (tolUlps >= 0 ? u <= tolUlps : rel <= tolRel) {
        out.counts.pass++;
        continue;
      }
      failing.push(i);
      outcomes[i] = {
        kind: 'fail',
        diagnosis: { kind: 'unexplained', relativeError: rel },
        ulps: u,
        relativeError: rel,
      };
      continue;
    }
    const check = checkValue([ar, ai], [er, ei], tol, zeroSigns);
    if (check.pass) {
      out.counts.pass++;
      continue;
    }
    failing.push(i);
    outcomes[i] = {
      kind: 'fail',
      diagnosis: { kind: 'unexplained', relativeError: check.relativeError },
      ulps: check.ulps,
      relativeError: check.relativeError,
    };
  }
  out.counts.fail = failing.length;

  // Diagnose each failure against the alternatives the expectation computes.
  const diagnoses: (Diagnosis | null)[] = new Array(n).fill(null);
  const alternatives = new Map<number, ReturnType<Expectation['alternatives']>>();
  const straddle = path.kind === 'straddle';
  for (const i of failing) {
    const exp: ComplexDouble = [ere[i] as number, eim[i] as number];
    const act: ComplexDouble = [are[i] as number, aim[i] as number];
    const o = outcomes[i] as Extract<PointOutcome, { kind: 'fail' }>;
    // Merely inaccurate: within 1e-9 of the expected value, finite, zero signs right, at an input
    // with no zero part and off a straddle. Every alternative (other sheet, other side, flipped
    // zero) is then far further away, so none is computed; the listed findings still get theirs.
    if (
      !straddle &&
      o.relativeError <= MERELY_INACCURATE &&
      re[i] !== 0 &&
      im[i] !== 0 &&
      are[i] !== 0 &&
      aim[i] !== 0 &&
      ere[i] !== 0 &&
      eim[i] !== 0
    ) {
      diagnoses[i] = { kind: 'inaccurate', ulps: o.ulps, relativeError: o.relativeError, ...worstPart(act, exp) };
      continue;
    }
    let alt;
    try {
      alt = expectation.alternatives(path, points, i, exp);
    } catch (e) {
      alt = { rule: `(alternatives unavailable: ${errorText(e)})` };
    }
    alternatives.set(i, alt);
    const check = {
      pass: false,
      ulps: o.ulps,
      relativeError: o.relativeError,
      zeroSignDiffers: [] as ('re' | 'im')[],
      finitenessDiffers: false,
    };
    const full =
      act.every(Number.isFinite) && exp.every(Number.isFinite) && !act.some((x) => x === 0)
        ? check
        : checkValue(act, exp, tol, zeroSigns);
    diagnoses[i] = diagnoseFailure({
      actual: act,
      expected: exp,
      check: full,
      flippedZero: alt.flippedZero,
      otherSide: alt.otherSide,
      otherSheets: alt.otherSheets,
    });
  }

  // Along a continuous path, compare where the values jump.
  if (CONTINUOUS.has(path.kind)) {
    const t = inputs.t;
    // Column-wise, NaN where a value is missing: no per-point allocation on long paths.
    const column = (r: Float64Array, m: Float64Array, missing: (i: number) => boolean) => {
      const cr = Float64Array.from(r);
      const ci = Float64Array.from(m);
      for (let i = 0; i < n; i++) if (missing(i)) cr[i] = ci[i] = NaN;
      return [cr, ci] as const;
    };
    const [xr, xi] = hasSkips ? column(ere, eim, (i) => expected.skipped.has(i)) : [ere, eim];
    const [yr, yi] =
      hasSkips || hasErrors ? column(are, aim, (i) => actual.errors.has(i) || expected.skipped.has(i)) : [are, aim];
    const ej = detectJumpsInColumns(xr, xi);
    const aj = detectJumpsInColumns(yr, yi);
    const mid = (i: number) => ((t[i] as number) + (t[i + 1] as number)) / 2;
    const where = (j: Uint8Array) => {
      const at: number[] = [];
      for (let i = 0; i < j.length; i++) if (j[i]) at.push(mid(i));
      return at;
    };
    out.jumps = { expected: where(ej), library: where(aj) };
    if (failing.length > 0) {
      const redone = findMisplacedCuts(t, [], [], diagnoses, { expected: ej, actual: aj });
      redone.forEach((d, i) => (diagnoses[i] = d));
    }
    try {
      const mono = expectation.monodromy(path);
      const actPairs = mono ? points.map((_, i): ComplexDouble => [yr[i] as number, yi[i] as number]) : [];
      if (mono)
        out.monodromy = monodromyCheck(
          t,
          actPairs,
          actual.errors,
          mono,
          suite.tolerances.monodromy ?? DEFAULT_MONODROMY,
        );
    } catch (e) {
      out.monodromy = {
        expected: { re: 'nan', im: 'nan' },
        library: null,
        relativeError: null,
        pass: false,
        note: errorText(e),
      };
    }
  }

  for (const i of failing) {
    const o = outcomes[i] as Extract<PointOutcome, { kind: 'fail' }>;
    o.diagnosis = diagnoses[i] as Diagnosis;
    out.byDiagnosis[o.diagnosis.kind] = (out.byDiagnosis[o.diagnosis.kind] ?? 0) + 1;
  }
  const listed = [...failing, ...errored].sort((a, b) => a - b);
  for (const i of listed.slice(0, maxFindings)) {
    const p = points[i] as PathPoint;
    const z: ComplexPair = [p.z.re, p.z.im];
    const skippedHere = expected.skipped.has(i);
    let alt = alternatives.get(i);
    if (!alt && outcomes[i]?.kind === 'fail') {
      try {
        alt = expectation.alternatives(path, points, i, [ere[i] as number, eim[i] as number]);
      } catch {
        alt = undefined;
      }
    }
    const finding: PointFinding = {
      path: path.name,
      index: i,
      t: p.t,
      ...(p.label ? { label: p.label } : {}),
      z: wire(z),
      zHex: { re: formatHexDouble(z[0]), im: formatHexDouble(z[1]) },
      expected: skippedHere ? null : wire([ere[i] as number, eim[i] as number]),
      actual: actual.errors.has(i) ? null : wire([are[i] as number, aim[i] as number]),
      outcome: outcomes[i] as PointOutcome,
      rule: alt?.rule ?? '',
      reproducer: reproducer(program, target, z, suite.subject),
    };
    if (alt?.limits)
      finding.limits = { sides: alt.limits.sides, values: [wire(alt.limits.values[0]), wire(alt.limits.values[1])] };
    if (!alt) {
      try {
        finding.rule = expectation.alternatives(path, points, i, [ere[i] as number, eim[i] as number]).rule;
      } catch {
        finding.rule = '';
      }
    }
    out.findings.push(finding);
  }
  out.findingsOmitted = Math.max(0, listed.length - maxFindings);
  out.skipped = [...skipReasons].map(([reason, count]) => ({ reason, count }));
  return out;
}

function monodromyCheck(
  t: number[],
  values: ComplexDouble[],
  errors: Map<number, string>,
  mono: { factor: ComplexDouble; nu: [number, number] },
  tolerance: Tolerance,
): MonodromyCheck {
  const lib = libraryMonodromy(
    t,
    values.map((v, i) => (errors.has(i) ? null : v)),
    mono.nu,
  );
  if ('note' in lib)
    return { expected: wire(mono.factor), library: null, relativeError: null, pass: false, note: lib.note };
  const err = relativeError(lib.factor, mono.factor);
  const pass =
    'relative' in tolerance ? err <= tolerance.relative : checkValue(lib.factor, mono.factor, tolerance, false).pass;
  return { expected: wire(mono.factor), library: wire(lib.factor), relativeError: err, pass };
}
