import type { RunComparison } from './run-comparison';
import type { RunView } from './run-view';

/** A suite version waiting on someone: for review, or back with its author. */
export interface WaitingSuite {
  slug: string;
  version: number;
  title: string;
  subject: string;
  authorName: string;
  /** When it was submitted (review queue) or reviewed (changes requested). */
  since: string;
  reviewerName: string | null;
  reviewComment: string | null;
}

/**
 * Regressions waiting on the caller in the latest completed run of one plan: all of that run's
 * when the caller is on the plan's mail list (`targetKey` null), else those on one library the
 * caller subscribes to.
 */
export interface WaitingRegression {
  /** The library, or null for every library of a plan whose mail the caller receives. */
  targetKey: string | null;
  runId: string;
  planName: string;
  finishedAt: string;
  count: number;
  /** How many of `count` are branch findings; the rest are accuracy findings. */
  branch: number;
}

/** Everything the Overview screen shows, in one answer (`GET /api/overview`). */
export interface OverviewView {
  /**
   * Every plan with its latest completed run and how it compares with the completed run before
   * it (null for a plan's first completed run), and a newer run that has not completed (queued,
   * running, cancelled or failed), which never hides the completed one's regressions. Most
   * recently started first, then plans never run.
   */
  plans: {
    planId: string;
    planName: string;
    completed: RunView | null;
    comparison: RunComparison | null;
    newer: RunView | null;
  }[];
  /** Queued and running runs, newest first. */
  inProgress: RunView[];
  needsMe: {
    /** Suites whose newest version is submitted; null when the caller cannot review. */
    reviewQueue: WaitingSuite[] | null;
    /** The caller's suites whose newest version came back with changes requested. */
    changesRequested: WaitingSuite[];
    /** The libraries the caller subscribes to. */
    subscriptions: string[];
    /** The plans whose regression mail the caller receives (their mail lists name the caller's address). */
    mailPlans: string[];
    /** Regressions in those plans and on those libraries, not covered by an accepted deviation. */
    regressions: WaitingRegression[];
  };
}
