import type { Tolerance } from '../../../shared/schemas/tolerance-schema';
import type { ComplexDouble } from '../../checks/complex-double';
import { detectJumpsInColumns } from '../../checks/detect-jumps';
import { findMisplacedCuts } from '../../checks/find-misplaced-cuts';
import { misplacedCutGroups } from '../../checks/misplaced-cut-groups';
import { confirmJumps } from './confirm-jumps';
import { errorText } from './error-text';
import { monodromyCheck } from './monodromy-check';
import type { PathRun } from './path-run';

/** The monodromy tolerance when a suite gives none: the factors are products of exactly known roots of unity. */
const DEFAULT_MONODROMY: Tolerance = { relative: 1e-12 };
const CONTINUOUS = new Set(['circle', 'segment', 'polyline']);

/**
 * Along a continuous path: where the expected and the library's values jump (a failure next to a
 * jump of only one of them is re-diagnosed as a misplaced cut once refinement between the two
 * samples confirms that jump: confirm-jumps.ts, which calls the target again), and along a closed path of a
 * regular branch, the library's monodromy against the branch's. Other paths are left alone.
 */
export async function compareAlongPath(run: PathRun): Promise<void> {
  if (!CONTINUOUS.has(run.path.kind)) return;
  const { out, expected, actual, labels } = run;
  const n = run.points.length;
  const t = run.inputs.t;
  const hasSkips = expected.skipped.size > 0;
  const hasErrors = actual.errors.size > 0;
  // Column-wise, NaN where a value is missing: no per-point allocation on long paths.
  const column = (r: Float64Array, m: Float64Array, missing: (i: number) => boolean) => {
    const cr = Float64Array.from(r);
    const ci = Float64Array.from(m);
    for (let i = 0; i < n; i++) if (missing(i)) cr[i] = ci[i] = NaN;
    return [cr, ci] as const;
  };
  const [xr, xi] = hasSkips
    ? column(expected.re, expected.im, (i) => expected.skipped.has(i))
    : [expected.re, expected.im];
  const [yr, yi] =
    hasSkips || hasErrors
      ? column(actual.re, actual.im, (i) => actual.errors.has(i) || expected.skipped.has(i))
      : [actual.re, actual.im];
  const ej = detectJumpsInColumns(xr, xi);
  const aj = detectJumpsInColumns(yr, yi);
  const mid = (i: number) => ((t[i] as number) + (t[i + 1] as number)) / 2;
  const where = (j: Uint8Array) => {
    const at: number[] = [];
    for (let i = 0; i < j.length; i++) if (j[i]) at.push(mid(i));
    return at;
  };
  out.jumps = { expected: where(ej), library: where(aj) };
  if (run.failing.length > 0) {
    const groups = misplacedCutGroups(labels, ej, aj);
    const confirmed =
      groups.length === 0
        ? new Set<number>()
        : await confirmJumps(
            run,
            groups.flatMap((g) => g.steps),
            { expected: ej, actual: aj },
            { expected: [xr, xi], library: [yr, yi] },
          );
    const redone = findMisplacedCuts(t, [], [], labels, { expected: ej, actual: aj }, confirmed);
    redone.forEach((d, i) => (labels[i] = d));
  }
  try {
    const mono = run.expectation.monodromy(run.path);
    const actPairs = mono ? run.points.map((_, i): ComplexDouble => [yr[i] as number, yi[i] as number]) : [];
    if (mono)
      out.monodromy = monodromyCheck(
        t,
        actPairs,
        actual.errors,
        mono,
        run.suite.tolerances.monodromy ?? DEFAULT_MONODROMY,
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
