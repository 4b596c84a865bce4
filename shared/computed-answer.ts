/**
 * How an answer of the harness came about, sent beside it so the app can say so: how long the
 * computation took, and whether this answer was kept from an earlier request.
 */
export interface ComputedAnswer {
  computedMs: number;
  fromCache: boolean;
}
