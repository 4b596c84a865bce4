import type { Suite } from '../../../shared/schemas/suite-schema';
import type { Target } from '../../adapters/target';
import { parseSubject } from '../../expressions/parse-subject';
import { suiteExpectation } from '../expectations/suite-expectation';
import type { ReferenceCache } from '../reference-cache/reference-cache';
import { suiteCacheKey } from '../reference-cache/suite-cache-key';
import { subjectProgram } from './subject-program';
import type { SuiteCounterpart } from './suite-counterpart';

/**
 * The suite's counterparts against one target. Another subject gets its own expectation from the
 * same reference engine, under the suite's branch and convention (its own cuts: z^(1/2) and
 * sqrt(z) share theirs, exp(log(z)/3) and cbrt(z) too); the same subject through another entry
 * shares the suite's. Throws on a subject that does not parse, as the suite's own would.
 */
export async function prepareCounterparts(
  suite: Suite,
  target: Target,
  cache: ReferenceCache,
): Promise<SuiteCounterpart[]> {
  const out: SuiteCounterpart[] = [];
  for (const c of suite.counterparts) {
    const subject = c.subject ?? suite.subject;
    const expr = parseSubject(subject);
    const program = subjectProgram(expr);
    const same = subject === suite.subject;
    const own = same ? null : { ...suite, subject };
    const cacheKey = own ? suiteCacheKey(own) : '';
    const unsupported: string[] = [];
    for (const op of program.ops) if (!(await target.supports(op))) unsupported.push(op);
    out.push({
      with: c.entry === undefined ? subject : `${subject} through entry ${c.entry}`,
      subject,
      ...(c.entry === undefined ? {} : { entry: c.entry }),
      program,
      expectation: own ? { expectation: suiteExpectation(own, expr, cache, cacheKey), cacheKey } : null,
      unsupported,
    });
  }
  return out;
}
