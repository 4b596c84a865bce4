import type { ComplexPair } from '../adapters/complex-pair';
import type { LawContext } from './law-context';
import type { LawFinding } from './law-finding';

/**
 * One law of a property check: its formula and published source (both go into the check's
 * title), how many points a run draws, when it applies to a subject, which points it says
 * nothing about, and the check itself on the library's values (null when it holds).
 */
export interface PropertyLaw {
  formula: string;
  source: string;
  /**
   * What the law allows, in terms of t, the tolerance of one library value (law-tolerance.ts):
   * each law scales it by the condition of the operations it composes. It goes into the title.
   */
  allowance: string;
  arity: 1 | 2;
  /** The library operations the law uses besides the subject's own. */
  ops(ctx: LawContext): string[];
  /** Null when the law applies to this subject and convention, else why not. */
  notApplicable(ctx: LawContext): string | null;
  /** True for a point where the law makes no claim (it is then not counted as a run). */
  excludes(ctx: LawContext, points: readonly ComplexPair[]): boolean;
  check(ctx: LawContext, points: readonly ComplexPair[]): Promise<LawFinding | null>;
}
