import type { DataSource } from 'typeorm';
import { FAILURE_ROW_FIELDS } from '../../shared/failure-row-fields';
import type { FailureView } from '../../shared/failure-view';
import type { FailureQuery } from '../../shared/schemas/failure-query';
import { FAILURE_COLUMNS, failureSearchSql, RANK } from '../sql/failure-search-sql';

export type FailureRow = FailureView;

/** The long text a page of the table does not show; the detail view and the CSV ask for it. */
// Read back under each field's key, as the row's own columns are (first_left_step → firstLeftStep).
const DETAIL_COLUMNS = FAILURE_ROW_FIELDS.filter((f) => f.shown === 'detail')
  .map((f) => `, ${f.column} AS "${f.key}"`)
  .join('');

/** One page of the failure table as rows, for the CSV export; with `only`, that one failure (its detail view). */
export async function searchFailures(
  dataSource: DataSource,
  q: FailureQuery,
  detail = false,
  only?: string,
): Promise<{ rows: FailureRow[]; next: string | null }> {
  const { from, order, params } = failureSearchSql(q, only);
  const rows: (FailureRow & { _rank: number })[] = await dataSource.query(
    `SELECT ${FAILURE_COLUMNS}${detail ? DETAIL_COLUMNS : ''}, ${RANK} AS _rank FROM ${from} ORDER BY ${order} LIMIT $${params.length}`,
    params,
  );
  const last = rows[rows.length - 1];
  const next =
    rows.length === q.limit && last ? `${last.id}:${last._rank}${q.sort === 'ulps' ? `:${last.ulps ?? 0}` : ''}` : null;
  return { rows: rows.map(({ _rank, ...row }) => row), next };
}
