import type { PropertyOutcome } from '../../shared/property-outcome';
import type { Suite } from '../../shared/schemas/suite-schema';
import type { Target } from '../adapters/target';
import { subjectCuts } from '../cuts/subject-cuts';
import { parseSubject } from '../expressions/parse-subject';
import { checkProperty } from './check-property';

/**
 * Every property check of a suite against one target, in the suite's order. The subject is
 * parsed once; the expected cuts come from the branch spec (subject-cuts.ts); the tolerance is
 * the suite's `properties` tolerance, or its `values` tolerance when it gives none. Once
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
    convention: suite.convention,
    tolerance: suite.tolerances.properties ?? suite.tolerances.values,
  };
  const outcomes: PropertyOutcome[] = [];
  for (const check of suite.properties) {
    if (signal?.aborted) break;
    outcomes.push(await checkProperty(check, subject, target));
  }
  return outcomes;
}
