import type { Suite } from './schemas/suite-schema';
import type { SuiteStatus } from './suite-status';

/** One version of a suite as the API shows it. */
export interface SuiteVersionView {
  id: string;
  suiteId: string;
  slug: string;
  version: number;
  status: SuiteStatus;
  body: Suite;
  author: { id: string; displayName: string };
  reviewer: { id: string; displayName: string } | null;
  reviewComment: string | null;
  createdAt: string;
  submittedAt: string | null;
  reviewedAt: string | null;
}
