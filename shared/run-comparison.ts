/** Failed and error points counted over some suite × target pairs of a run. */
export interface PairCounts {
  fail: number;
  error: number;
}

/**
 * A completed run compared with the completed run of its plan before it. Pairs are suite ×
 * target key (a library without its version, as regressions are matched), so an upgrade is
 * compared with the version before it. Counts over the pairs both runs checked are compared;
 * the pairs only one run checked are counted apart, under the targets or suites that made them,
 * so a changed target set is never read as the library getting worse or better.
 */
export interface RunComparison {
  previous: { id: string; finishedAt: string | null };
  /** How many suite × target pairs both runs checked, and the change in their failed and error points (latest − previous). */
  common: PairCounts & { pairs: number };
  /**
   * Targets only the latest run checked, with the points of their pairs in it: a new library by
   * its key, and a library checked at a different number of versions than before by those
   * versions (its summed counts would compare two versions with one).
   */
  targetsAdded: PairCounts & { targets: string[] };
  /** Targets only the previous run checked, named as in `targetsAdded`, with the points of their pairs in it. */
  targetsRemoved: PairCounts & { targets: string[] };
  /** Suites only the latest run checked (on targets both checked), with the points of their pairs in it. */
  suitesAdded: PairCounts & { slugs: string[] };
  /** Suites only the previous run checked (on targets both checked), with the points of their pairs in it. */
  suitesRemoved: PairCounts & { slugs: string[] };
}
