import type { PairStatus, SuiteTargetResult } from '../../../shared/run-result';

/** What the errors of a pair say when not a single point could be checked. */
export const NOTHING_CHECKED =
  'nothing was checked: every point was skipped or not applicable to the entry (see the reasons per path)';

/**
 * The status of a suite × target pair, from its counts, errors, monodromy checks and property
 * checks. A pair whose every point was skipped (a library without the function, say) is an
 * error, not a pass: a green result with nothing checked would mislead. Adds the
 * NOTHING_CHECKED note to `errors` when that is why; so is a pair whose every point was not
 * applicable to the entry (results stored before entries have no such count: read as 0).
 */
export function pairStatus(
  result: Pick<SuiteTargetResult, 'counts' | 'errors' | 'paths' | 'properties'>,
  cancelled: boolean,
): PairStatus {
  const { counts, errors } = result;
  if (
    counts.pass + counts.fail + counts.error === 0 &&
    counts.skipped + (counts.notApplicable ?? 0) > 0 &&
    !errors.includes(NOTHING_CHECKED)
  )
    errors.push(NOTHING_CHECKED);
  if (cancelled) return 'cancelled';
  if (counts.error > 0 || errors.length > 0) return 'error';
  const checkFailed =
    result.paths.some((p) => p.monodromy && !p.monodromy.pass) ||
    (result.properties ?? []).some((p) => p.kind === 'failed');
  return counts.fail > 0 || checkFailed ? 'fail' : 'pass';
}
