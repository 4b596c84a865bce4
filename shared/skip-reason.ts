/**
 * Why some points of a path were skipped, with how many. `lacks` names the operations the
 * target does not have when that is the reason: the target's fingerprint page lists what it
 * has, so the run page can send a reader there instead of to an empty failure table.
 */
export interface SkipReason {
  reason: string;
  count: number;
  lacks?: string[];
}
