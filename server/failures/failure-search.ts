import type { DataSource } from 'typeorm';
import { FAILURE_ROW_FIELDS } from '../../shared/failure-row-fields';
import type { FailureView } from '../../shared/failure-view';
import type { FailureQuery } from '../../shared/schemas/failure-query';
import { FAILURE_COLUMNS, failureSearchSql } from '../sql/failure-search-sql';

export type FailureRow = FailureView;

/** The long text a page of the table does not show; the detail view and the CSV ask for it. */
const DETAIL_COLUMNS = FAILURE_ROW_FIELDS.filter((f) => f.shown === 'detail')
  .map((f) => `, ${f.column}`)
  .join('');

/** One page of the failure table as rows, for the CSV export and one failure's detail. */
export async function searchFailures(
  dataSource: DataSource,
  q: FailureQuery,
  detail = false,
): Promise<{ rows: FailureRow[]; next: string | null }> {
  const { where, order, params } = failureSearchSql(q);
  const rows: FailureRow[] = await dataSource.query(
    `SELECT ${FAILURE_COLUMNS}${detail ? DETAIL_COLUMNS : ''} FROM failures f ${where} ORDER BY ${order} LIMIT $${params.length}`,
    params,
  );
  const last = rows[rows.length - 1];
  const next = rows.length === q.limit && last ? (q.sort === 'ulps' ? `${last.id}:${last.ulps ?? 0}` : last.id) : null;
  return { rows, next };
}
