/**
 * Which versions of the failure's library a decision covers, counted from the version it was
 * given on: that version only, that version and every later one (ordered as
 * `harness/adapters/compare-versions.ts` orders them), or every version, earlier ones included.
 * A decision recorded without saying (every decision before issue 15, and an API client that
 * leaves `versions` out) covers every version, which is what those decisions always meant.
 */
export const DECISION_VERSIONS = ['this-version', 'this-and-later', 'every-version'] as const;

export type DecisionVersions = (typeof DECISION_VERSIONS)[number];

/** What `versions` means when a request leaves it out (the meaning of every decision stored before it existed). */
export const DEFAULT_DECISION_VERSIONS: DecisionVersions = 'every-version';
