import type { Suite } from '../../../shared/schemas/suite-schema';
import type { SubjectExpr } from '../../expressions/subject-expr';
import type { ReferenceCache } from '../reference-cache/reference-cache';
import type { Expectation } from './expectation';
import { principalExpectation } from './principal-expectation';
import { regularExpectation } from './regular-expectation';

/**
 * What a suite's points are expected to equal, chosen by its branch: the principal reference of
 * the whole subject, or the regular branch continued on the cut plane. The one choice every
 * evaluation and the server's failure pictures make, so both compute the same expected values.
 */
export function suiteExpectation(
  suite: Suite,
  expr: SubjectExpr,
  cache: ReferenceCache,
  cacheKey: string,
): Expectation {
  return suite.branch.kind === 'principal'
    ? principalExpectation(suite, expr, cache, cacheKey)
    : regularExpectation(suite, cache, cacheKey);
}
