import type { Expectation } from '../expectations/expectation';
import type { SubjectProgram } from './subject-program';

/**
 * A suite's counterpart ready to evaluate against one target: the subject's program through the
 * library, the entry to build its inputs with, and its own expected values (the reference engine
 * on its own subject, so its own cuts), or the suite's when it computes the same subject.
 */
export interface SuiteCounterpart {
  /** How results name it: "z^(1/2)", or "sqrt(z) through entry parser". */
  with: string;
  subject: string;
  entry?: string;
  program: SubjectProgram;
  /** Its expectation and reference-cache key; null: the suite's own (same subject). */
  expectation: { expectation: Expectation; cacheKey: string } | null;
  /** Operations of its subject the target lacks: no point can then be evaluated that way. */
  unsupported: string[];
}
