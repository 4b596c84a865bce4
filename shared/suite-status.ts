/**
 * The life of a suite version: a contributor writes a draft and submits it; a reviewer
 * approves it or requests changes (the author edits and submits again); an approved version
 * can be retired. Only approved versions join plans. Editing an approved suite starts a new
 * draft version; the approved one stays as it was.
 */
export const SUITE_STATUSES = ['draft', 'submitted', 'approved', 'changes-requested', 'retired'] as const;

export type SuiteStatus = (typeof SUITE_STATUSES)[number];
