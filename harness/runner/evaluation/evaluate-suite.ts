import { describeTolerance } from '../../../shared/describe-tolerance';
import type { SuiteTargetResult } from '../../../shared/run-result';
import type { Suite } from '../../../shared/schemas/suite-schema';
import type { SuitePath } from '../../../shared/schemas/suite-path-schema';
import type { TargetEntry } from '../../../shared/target-entry';
import { findEntry } from '../../adapters/find-entry';
import type { Target } from '../../adapters/target';
import { parseSubject } from '../../expressions/parse-subject';
import { buildPath } from '../../paths/build-path';
import type { PathPoint } from '../../paths/path-point';
import { addTally } from './add-tally';
import { emptyClassCounts } from './empty-class-counts';
import { emptyCounts } from './empty-counts';
import { errorText } from './error-text';
import { evaluatePath } from './evaluate-path';
import type { Expectation } from '../expectations/expectation';
import { pairStatus } from './pair-status';
import { prepareCounterparts } from './prepare-counterparts';
import type { PathEvaluation } from './path-evaluation';
import type { SuiteCounterpart } from './suite-counterpart';
import { ReferenceCache } from '../reference-cache/reference-cache';
import { suiteExpectation } from '../expectations/suite-expectation';
import { subjectProgram, type SubjectProgram } from './subject-program';
import { suiteCacheKey } from '../reference-cache/suite-cache-key';
import { toPathSpec } from './to-path-spec';
import { conventionMismatchReason } from '../../adapters/convention-mismatch-reason';

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

const DEFAULT_MAX_FINDINGS = 200;
/** Points of each path object already built: a suite checked against several targets builds its paths once. */
const BUILT = new WeakMap<SuitePath, PathPoint[] | Error>();

/**
 * One suite against one target (docs/vocabulary.md, docs/architecture.md): every point of every path evaluated with
 * the library's own operations and compared sign-exactly with the expected value (principal:
 * the reference of the whole subject under the suite's convention; regular: the continued
 * branch on the cut plane); each failure diagnosed (zero-sign, cut-side, other-sheet,
 * inaccurate, not-finite, and along continuous paths misplaced-cut from the jumps of both);
 * closed paths of regular branches checked for their monodromy. Failures carry the input's
 * exact bits, both one-sided limits on a cut, the rule that fixes the expected value and a
 * reproducer. Property checks are not run here (evaluatePair runs them after the values).
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
      tolerance: describeTolerance(suite.tolerances.values),
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
    byClass: emptyClassCounts(),
    paths: [],
    properties: null,
    errors: [],
    durationMs: 0,
    reference: { computed: 0, cached: 0 },
  };
  let program: SubjectProgram;
  let expectation: Expectation;
  let targetConvention: PathEvaluation['targetConvention'];
  let cacheKey = '';
  // The entry of each selected path (its own, else the suite's, else the target's default); an
  // entry the target does not offer makes the pair an error naming it, before any value is computed.
  const suiteEntry = findEntry(target, suite.entry);
  const entryOf = new Map<number, TargetEntry>();
  const missingEntries = new Set<string>();
  for (const i of selected) {
    const named = suite.paths[i]?.entry;
    const found = named === undefined ? suiteEntry : findEntry(target, named);
    if (found instanceof Error) missingEntries.add(found.message);
    else entryOf.set(i, found);
  }
  if (!(suiteEntry instanceof Error)) result.checked.entry = suiteEntry.name;
  if (missingEntries.size > 0) {
    result.errors.push(...[...missingEntries].map((m) => `the suite cannot be evaluated: ${m}`));
    result.status = 'error';
    result.durationMs = Date.now() - started;
    return result;
  }
  try {
    const expr = parseSubject(suite.subject);
    program = subjectProgram(expr);
    cacheKey = suiteCacheKey(suite);
    const key = cacheKey;
    expectation = suiteExpectation(suite, expr, cache, key);
    result.checked.branch = expectation.description;
    if (target.convention !== undefined && target.convention !== suite.convention) {
      const theirs = { ...suite, convention: target.convention };
      const theirKey = suiteCacheKey(theirs);
      targetConvention = {
        expectation: suiteExpectation(theirs, expr, cache, theirKey),
        cacheKey: theirKey,
        reason: conventionMismatchReason({ name: target.name, convention: target.convention }, suite.convention),
      };
    }
  } catch (e) {
    result.errors.push(`the suite cannot be evaluated: ${errorText(e)}`);
    result.status = 'error';
    result.durationMs = Date.now() - started;
    return result;
  }
  const unsupported: string[] = [];
  for (const op of program.ops) if (!(await target.supports(op))) unsupported.push(op);
  let counterparts: SuiteCounterpart[];
  try {
    counterparts = await prepareCounterparts(suite, target, cache);
  } catch (e) {
    result.errors.push(`the suite's counterparts cannot be evaluated: ${errorText(e)}`);
    result.status = 'error';
    result.durationMs = Date.now() - started;
    return result;
  }

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
    const entry = entryOf.get(selected[k] as number) as TargetEntry;
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
        counts: { ...emptyCounts(), skipped: n },
        byDiagnosis: {},
        byClass: emptyClassCounts(),
        jumps: null,
        monodromy: null,
        findings: [],
        findingsOmitted: 0,
        skipped: [{ reason, count: n }],
      });
      continue;
    }
    const pathResult = await evaluatePath({
      suite,
      cache,
      cacheKey,
      target,
      entry,
      program,
      expectation,
      path,
      points,
      unsupported,
      counterparts,
      ...(targetConvention ? { targetConvention } : {}),
      maxFindings,
      signal: options.signal,
    });
    result.paths.push(pathResult);
    done += Array.isArray(points) ? points.length : 0;
    options.onProgress?.(done, total);
  }
  for (const p of result.paths) {
    addTally(result, p);
    if (p.error) result.errors.push(`${p.name}: ${p.error}`);
  }
  result.status = pairStatus(result, options.signal?.aborted === true);
  result.reference = { computed: cache.computed - computed0, cached: cache.cached - cached0 };
  result.durationMs = Date.now() - started;
  return result;
}
