import type { FailureQuery } from '../shared/schemas/failure-query';

/** What the failure table is filtered and sorted by: the query of GET /api/failures without the page. */
export type FailureFilters = Partial<
  Pick<FailureQuery, 'run' | 'suite' | 'target' | 'fn' | 'class' | 'diagnosis' | 'convention' | 'status' | 'sort'>
>;
