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
  /** The last person who edited this version; the four-eyes rule keeps them from reviewing it. */
  author: { id: string; displayName: string };
  /** Whose draft the author took over by editing it, or null when the author wrote it alone. */
  takenOverFrom: { id: string; displayName: string } | null;
  reviewer: { id: string; displayName: string } | null;
  reviewComment: string | null;
  createdAt: string;
  submittedAt: string | null;
  reviewedAt: string | null;
}
