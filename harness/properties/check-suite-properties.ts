import type { PropertyOutcome } from '../../shared/property-outcome';
import type { Suite } from '../../shared/schemas/suite-schema';
import type { Target } from '../adapters/target';
import { subjectCuts } from '../cuts/subject-cuts';
import { parseSubject } from '../expressions/parse-subject';
import { checkProperty } from './check-property';

/**
 * Every property check of a suite against one target, in the suite's order. The subject is
 * parsed once; the expected cuts come from the branch spec (subject-cuts.ts); the tolerance is
 * the suite's `properties` tolerance, or its `values` tolerance when it gives none. A target that
 * states a convention other than the suite's (TargetIdentity.convention) is held to the laws under
 * its own convention, which each check's title names: under the suite's, the laws that read the
 * side of a cut (range, unwinding, symmetries at zero parts) would report the library's documented
 * convention as failures, as the points do (convention-mismatch-reason.ts). Once
 * `signal` is aborted (the evaluation ran out of time) no further check is started.
 */
export async function checkSuiteProperties(
  suite: Suite,
  target: Target,
  signal?: AbortSignal,
): Promise<PropertyOutcome[]> {
  const expr = parseSubject(suite.subject);
  const subject = {
    text: suite.subject,
    expr,
    cuts: subjectCuts(expr, suite.branch),
    convention: target.convention ?? suite.convention,
    tolerance: suite.tolerances.properties ?? suite.tolerances.values,
  };
  const outcomes: PropertyOutcome[] = [];
  for (const check of suite.properties) {
    if (signal?.aborted) break;
    outcomes.push(await checkProperty(check, subject, target));
  }
  return outcomes;
}
