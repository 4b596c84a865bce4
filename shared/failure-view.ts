import type { FAILURE_ROW_FIELDS } from './failure-row-fields';

type Field = (typeof FAILURE_ROW_FIELDS)[number];

/**
 * A row of the failure table (GET /api/failures), derived from `FAILURE_ROW_FIELDS`: its `row`
 * fields always, its `detail` fields (`rule`, `reproducer`, `limits`) only with one failure
 * (GET /api/failures/:id) and in the CSV.
 */
export type FailureView = { [F in Extract<Field, { shown: 'row' }> as F['key']]: F['value'] } & {
  [F in Extract<Field, { shown: 'detail' }> as F['key']]?: F['value'];
};
