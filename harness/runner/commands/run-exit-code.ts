import type { RunResult } from '../../../shared/run-result';

/**
 * The exit code of `sheetkeeper run` for a finished run: 0 when everything passed; 3 when the only
 * failures are accuracy findings (every failing point is on the right branch with the right zero
 * signs, just further from the reference than the tolerance); 1 for anything else that is not a
 * pass — a branch finding, a point or pair that could not be evaluated, a failed monodromy or
 * property check, a cancelled run. 2 (bad input) is decided before a run starts (runCommand).
 * A CI job can then fail on branch findings and only warn on accuracy with `|| [ $? -eq 3 ]`.
 */
export function runExitCode(result: RunResult): 0 | 1 | 3 {
  if (result.status === 'pass') return 0;
  const accuracyOnly =
    result.status === 'fail' &&
    result.byClass.branch === 0 &&
    result.byClass.accuracy > 0 &&
    result.results.every(
      (r) =>
        (r.status === 'pass' || r.status === 'fail') &&
        r.paths.every((p) => !p.monodromy || p.monodromy.pass) &&
        (r.properties ?? []).every((o) => o.kind !== 'failed'),
    );
  return accuracyOnly ? 3 : 1;
}
