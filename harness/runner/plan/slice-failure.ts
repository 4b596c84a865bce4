import type { PathResult, SuiteTargetResult } from '../../../shared/run-result';
import type { Suite } from '../../../shared/schemas/suite-schema';
import type { TargetIdentity } from '../../../shared/target-identity';

/**
 * The result of a slice that produced none of its own — the target hung past the time limit,
 * crashed the worker, or the run was cancelled first: every point of its paths becomes an
 * error (or, when cancelled, skipped) with the reason, so the run goes on and says what happened.
 */
export function sliceFailure(
  suite: Suite,
  target: TargetIdentity,
  paths: number[],
  pathPoints: number[],
  reason: string,
  kind: 'error' | 'cancelled',
): SuiteTargetResult {
  const pathResults: PathResult[] = paths.map((p) => {
    const path = suite.paths[p];
    const n = pathPoints[p] ?? 0;
    return {
      name: path?.name ?? `path ${p}`,
      kind: path?.kind ?? 'segment',
      points: n,
      counts: { pass: 0, fail: 0, error: kind === 'error' ? n : 0, skipped: kind === 'cancelled' ? n : 0 },
      byDiagnosis: {},
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
      tolerance:
        'ulps' in suite.tolerances.values
          ? `${suite.tolerances.values.ulps} ulps per part`
          : `relative error ${suite.tolerances.values.relative}`,
      paths: paths.length,
      points,
      properties: { listed: suite.properties.map((p) => p.law), run: false, note: 'not run' },
    },
    counts: { pass: 0, fail: 0, error: kind === 'error' ? points : 0, skipped: kind === 'cancelled' ? points : 0 },
    byDiagnosis: {},
    paths: pathResults,
    properties: null,
    errors: kind === 'error' ? [reason] : [],
    durationMs: 0,
    reference: { computed: 0, cached: 0 },
  };
}
