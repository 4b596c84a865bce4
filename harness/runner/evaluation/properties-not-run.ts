import type { SuiteTargetResult } from '../../../shared/run-result';
import type { Suite } from '../../../shared/schemas/suite-schema';

/** What a result says of the suite's property checks when this evaluation did not run them. */
export function propertiesNotRun(suite: Suite): SuiteTargetResult['checked']['properties'] {
  const listed = suite.properties.map((p) => p.law);
  return {
    listed,
    run: false,
    note: listed.length > 0 ? 'listed in the suite but not run by this run' : 'the suite lists no property checks',
  };
}
