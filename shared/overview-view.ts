import type { OutcomeCounts } from './run-result';
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

/** Regressions on one subscribed library in the latest completed run of one plan. */
export interface SubscribedRegression {
  targetKey: string;
  runId: string;
  planName: string;
  finishedAt: string;
  count: number;
  /** How many of `count` are branch findings; the rest are accuracy findings. */
  branch: number;
}

/** Everything the Overview screen shows, in one answer (`GET /api/overview`). */
export interface OverviewView {
  /** Every plan with its latest finished run and the completed run before it, for the change in counts; most recently run first, then plans never run. */
  plans: {
    planId: string;
    planName: string;
    latest: RunView | null;
    previous: { id: string; counts: OutcomeCounts; finishedAt: string | null } | null;
  }[];
  /** Queued and running runs, newest first. */
  inProgress: RunView[];
  needsMe: {
    /** Suites whose newest version is submitted; null when the caller cannot review. */
    reviewQueue: WaitingSuite[] | null;
    /** The caller's suites whose newest version came back with changes requested. */
    changesRequested: WaitingSuite[];
    /** The libraries the caller subscribes to, and their regressions not covered by an accepted deviation. */
    subscriptions: string[];
    regressions: SubscribedRegression[];
  };
}
