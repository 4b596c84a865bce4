import type { DataSource } from 'typeorm';
import {
  buildPath,
  type ExpectedColumn,
  parseSubject,
  type PathPoint,
  ReferenceCache,
  subjectCuts,
  type SubjectExpr,
  suiteCacheKey,
  suiteExpectation,
  toPathSpec,
} from '../../harness';
import type { DiagnosisKind } from '../../shared/diagnosis';
import type { FailurePathPoint, FailurePathView, PlaneXY } from '../../shared/failure-path-view';
import type { OutcomeCounts } from '../../shared/run-result';
import type { WireComplex } from '../../shared/wire-complex';
import type { Suite } from '../../shared/schemas/suite-schema';
import { wireDouble } from '../../shared/wire-double';
import type { SuitePath } from '../../shared/schemas/suite-path-schema';
import { HttpError } from '../http/http-error';

/** A grid path can hold 4 million points; the pictures need far fewer, and the reference costs ~10 µs–200 ms a point. */
const MAX_POINTS = 20_000;
/** Paths whose expected values were computed lately, by suite version and path name: a reviewer opens several cases of one path. */
const RECENT_PATHS = 64;
const recent = new Map<string, PathValues>();

const argOf = (re: number, im: number): number | null =>
  Number.isFinite(re) && Number.isFinite(im) ? Math.atan2(im, re) : null;
const xy = (re: number, im: number): PlaneXY | null => (Number.isFinite(re) && Number.isFinite(im) ? { re, im } : null);

interface StoredPoint {
  id: string;
  point_index: number;
  outcome_kind: 'fail' | 'error' | 'skipped';
  diagnosis_kind: DiagnosisKind | null;
  ulps: number | null;
  actual: WireComplex | null;
}

/**
 * The path of a failing case, point by point, for the case screen's pictures.
 *
 * A run stores failing points in full but passing points only as a path summary (counts,
 * jumps, monodromy): not enough to draw the path. Rather than store every passing value (a
 * migration and ~50× more rows per run), the points are rebuilt here from the suite version's
 * path and their expected values computed again with the reference engine, exactly as the
 * run did; the failing points of the same path come from the failures table. A passing point's
 * library value is then drawn as its expected value, which it matches within the tolerance.
 * Measured here (2 cores, every path of the complex.js nightly suites, cold): most principal
 * paths 0.2–90 ms, regular paths 80–300 ms, the worst three 0.9 s (√ of a Möbius map around its
 * pole), 3.6 s (a loop for √(z²−1) on another sheet) and 7–10 s (the straddle of the complex
 * power, whose 1e6-long cut at 5e-324 needs deep precision). Bounded by the path's sample count
 * and MAX_POINTS; the last RECENT_PATHS paths are kept, so the next case of one path is instant.
 * Runs on this machine keep their reference values on disk (config.referenceCacheDir), and this
 * reads them: after the demo seed, all 69 failing paths of its two runs answered in 1–8 ms each
 * with nothing computed again.
 */
export async function failurePath(
  dataSource: DataSource,
  failureId: string,
  referenceCacheDir: string | null = null,
): Promise<FailurePathView> {
  const [row] = await dataSource.query(
    `SELECT f.id::text AS id, f.shard_id, sh.suite_version_id, f.path_name, f.point_index, f.target_name, f.suite_slug, v.body
       FROM failures f JOIN shards sh ON sh.id = f.shard_id JOIN suite_versions v ON v.id = sh.suite_version_id WHERE f.id = $1`,
    [failureId],
  );
  if (!row) throw new HttpError(404, { kind: 'not-found', message: 'No failure with that number.' });
  const suite = row.body as Suite;
  const path = suite.paths.find((p) => p.name === row.path_name);
  if (!path)
    throw new HttpError(404, { kind: 'not-found', message: `The suite version has no path named ${row.path_name}.` });
  const expr = parseSubject(suite.subject);
  const { points, expected, reference } = pathValues(
    `${row.suite_version_id}|${path.name}`,
    suite,
    expr,
    path,
    referenceCacheDir,
  );

  const stored: StoredPoint[] = await dataSource.query(
    `SELECT id::text AS id, point_index, outcome_kind, diagnosis_kind, ulps, actual FROM failures WHERE shard_id = $1 AND path_name = $2 ORDER BY point_index`,
    [row.shard_id, row.path_name],
  );
  const byIndex = new Map(stored.map((s) => [s.point_index, s]));
  const [summary] = await dataSource.query(
    `SELECT jumps, counts FROM path_summaries WHERE shard_id = $1 AND path_name = $2 LIMIT 1`,
    [row.shard_id, row.path_name],
  );

  const out: FailurePathPoint[] = points.map((p, i) => {
    const failed = byIndex.get(i);
    const hasExpected = !expected.skipped.has(i);
    const expectedArg = hasExpected ? argOf(expected.re[i] as number, expected.im[i] as number) : null;
    if (!failed)
      return {
        index: i,
        t: p.t,
        z: xy(p.z.re, p.z.im),
        outcome: 'pass',
        diagnosis: null,
        ulps: null,
        expectedArg,
        actualArg: expectedArg,
        actualFrom: expectedArg === null ? 'none' : 'expected-within-tolerance',
        failureId: null,
      };
    const actualArg = failed.actual ? argOf(wireDouble(failed.actual.re), wireDouble(failed.actual.im)) : null;
    return {
      index: i,
      t: p.t,
      z: xy(p.z.re, p.z.im),
      outcome: failed.outcome_kind,
      diagnosis: failed.diagnosis_kind,
      ulps: failed.ulps,
      expectedArg,
      actualArg,
      actualFrom: actualArg === null ? 'none' : 'stored',
      failureId: failed.id,
    };
  });

  const { cuts, branchPoints, cutsNote } = expectedCuts(suite, expr);
  const counts: OutcomeCounts = summary?.counts ?? {
    pass: out.filter((p) => p.outcome === 'pass').length,
    fail: stored.filter((s) => s.outcome_kind === 'fail').length,
    error: stored.filter((s) => s.outcome_kind === 'error').length,
    skipped: stored.filter((s) => s.outcome_kind === 'skipped').length,
    notApplicable: 0,
  };
  const tol = suite.tolerances.values;
  return {
    failureId: row.id,
    focusIndex: row.point_index,
    suite: {
      slug: row.suite_slug,
      version: suite.version,
      subject: suite.subject,
      branch: suite.branch.kind,
      convention: suite.convention,
    },
    target: row.target_name,
    path: { name: path.name, kind: path.kind, points: points.length },
    axis: path.kind === 'straddle' || path.kind === 'grid' || path.kind === 'points' ? 'index' : 't',
    tolerance: { ulps: 'ulps' in tol ? tol.ulps : null, relative: 'relative' in tol ? tol.relative : null },
    points: out,
    cuts,
    cutsNote,
    branchPoints,
    jumps: summary?.jumps ?? null,
    counts,
    note: `Every point of the path “${path.name}” (${points.length}) with its outcome in this run. Failing points show the library's stored value; passing points are within the tolerance of the expected value and are drawn at it, since a run keeps no passing value one by one.`,
    reference,
  };
}

type PathValues = { points: PathPoint[]; expected: ExpectedColumn; reference: FailurePathView['reference'] };

/**
 * The path's points and their expected values, as the run computed them: read from the runs'
 * reference values on disk where they are there (the complex-power straddle: 7–10 s to compute,
 * a file read instead), computed otherwise.
 */
function pathValues(
  key: string,
  suite: Suite,
  expr: SubjectExpr,
  path: SuitePath,
  referenceCacheDir: string | null,
): PathValues {
  const known = recent.get(key);
  if (known) {
    recent.delete(key);
    recent.set(key, known);
    return known;
  }
  let points: PathPoint[];
  try {
    points = buildPath(toPathSpec(path));
  } catch (e) {
    throw new HttpError(409, {
      kind: 'conflict',
      message: `The path cannot be built: ${e instanceof Error ? e.message : String(e)}`,
    });
  }
  if (points.length > MAX_POINTS)
    throw new HttpError(409, {
      kind: 'conflict',
      message: `The path has ${points.length} points; pictures are drawn for paths of at most ${MAX_POINTS}.`,
    });
  // Read only: values computed here are not written back, so the runs' files have one writer per process that runs shards.
  const cache = new ReferenceCache(referenceCacheDir);
  const cacheKey = suiteCacheKey(suite);
  const expectation = suiteExpectation(suite, expr, cache, cacheKey);
  const value = {
    points,
    expected: expectation.expected(path, points),
    reference: { cached: cache.cached, computed: cache.computed },
  };
  recent.set(key, value);
  if (recent.size > RECENT_PATHS) recent.delete(recent.keys().next().value as string);
  return value;
}

/** The cuts a suite expects, as polylines, with the branch points at their finite ends. */
function expectedCuts(suite: Suite, expr: SubjectExpr): Pick<FailurePathView, 'cuts' | 'branchPoints' | 'cutsNote'> {
  const cuts: FailurePathView['cuts'] = [];
  const ends: PlaneXY[] = [];
  if (suite.branch.kind === 'regular') {
    for (const cut of suite.branch.cuts) {
      const pts = cut.points.map((p) => ({ re: wireDouble(p.re), im: wireDouble(p.im) }));
      cuts.push({ points: pts, toInfinity: cut.to_infinity });
      if (pts[0]) ends.push(pts[0]);
      if (!cut.to_infinity && pts.length > 1) ends.push(pts[pts.length - 1] as PlaneXY);
    }
  } else {
    const planeCuts = subjectCuts(expr, suite.branch);
    if (planeCuts === null) {
      return {
        cuts: [],
        branchPoints: [],
        cutsNote: `The cuts of ${suite.subject} are preimages of its functions' cuts, which are not computed here; the jumps along the path still show where the library and the reference jump.`,
      };
    }
    for (const c of planeCuts) {
      const from = { re: c.from[0], im: c.from[1] };
      const to = { re: c.to[0], im: c.to[1] };
      cuts.push({ points: [from, to], toInfinity: c.toInfinity });
      ends.push(from);
      if (!c.toInfinity) ends.push(to);
    }
  }
  const branchPoints = ends.filter(
    (p, i) =>
      Number.isFinite(p.re) && Number.isFinite(p.im) && ends.findIndex((q) => q.re === p.re && q.im === p.im) === i,
  );
  return { cuts, branchPoints, cutsNote: cuts.length === 0 ? `${suite.subject} has no cuts.` : null };
}
