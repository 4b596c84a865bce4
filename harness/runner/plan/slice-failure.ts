import { describeTolerance } from '../../../shared/describe-tolerance';
import type { PathResult, SuiteTargetResult } from '../../../shared/run-result';
import type { Suite } from '../../../shared/schemas/suite-schema';
import type { TargetIdentity } from '../../../shared/target-identity';
import { emptyClassCounts } from '../evaluation/empty-class-counts';
import { emptyCounts } from '../evaluation/empty-counts';
import { propertiesNotRun } from '../evaluation/properties-not-run';

/**
 * The one error result of a suite × target evaluation that produced none of its own — the
 * target could not be opened, threw, hung past the time limit, crashed its worker, or the run
 * was cancelled first: every point of its paths becomes an error (or, when cancelled, skipped)
 * with the reason, so the run goes on and says what happened. Suite, target and what was to be
 * checked (convention, branch, tolerance, paths, points) read as in a result of its own.
 */
export function sliceFailure(
  suite: Suite,
  target: TargetIdentity,
  paths: readonly number[],
  pathPoints: readonly number[],
  reason: string,
  kind: 'error' | 'cancelled',
): SuiteTargetResult {
  // Every point is an error, or skipped when the run was cancelled.
  const unchecked = (n: number) => ({ ...emptyCounts(), [kind === 'error' ? 'error' : 'skipped']: n });
  const pathResults: PathResult[] = paths.map((p) => {
    const path = suite.paths[p];
    const n = pathPoints[p] ?? 0;
    return {
      name: path?.name ?? `path ${p}`,
      kind: path?.kind ?? 'segment',
      points: n,
      counts: unchecked(n),
      byDiagnosis: {},
      byClass: emptyClassCounts(),
      jumps: null,
      monodromy: null,
      findings: [],
      findingsOmitted: 0,
      skipped: kind === 'cancelled' ? [{ reason, count: n }] : [],
      ...(kind === 'error' ? { error: reason } : {}),
    };
  });
  const points = pathResults.reduce((s, p) => s + p.points, 0);
  return {
    suite: { id: suite.id, version: suite.version, title: suite.title, subject: suite.subject },
    target: { name: target.name, library: target.library, version: target.version, settings: target.settings },
    status: kind,
    checked: {
      convention: suite.convention,
      branch: suite.branch.kind,
      tolerance: describeTolerance(suite.tolerances.values),
      paths: paths.length,
      points,
      properties: propertiesNotRun(suite),
    },
    counts: unchecked(points),
    byDiagnosis: {},
    byClass: emptyClassCounts(),
    paths: pathResults,
    properties: null,
    errors: kind === 'error' ? [reason] : [],
    durationMs: 0,
    reference: { computed: 0, cached: 0 },
  };
}
