import type { SuiteStatus } from './suite-status';

/** A suite in lists: its latest version and the newest approved one (the one plans use). */
export interface SuiteSummary {
  slug: string;
  title: string;
  subject: string;
  latestVersion: number;
  latestStatus: SuiteStatus;
  approvedVersion: number | null;
  authorName: string;
  updatedAt: string;
}
