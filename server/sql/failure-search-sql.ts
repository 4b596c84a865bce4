import { FAILURE_ROW_FIELDS } from '../../shared/failure-row-fields';
import type { FailureQuery } from '../../shared/schemas/failure-query';
import { coveredByDeviationSql } from './covered-by-deviation-sql';

/** A page row's fields in the order of the composite type `failure_table_row`, with the SQL that reads each. */
const ROW_FIELDS = FAILURE_ROW_FIELDS.filter((f) => f.shown === 'row');
const sqlOf = (f: (typeof ROW_FIELDS)[number]): string => ('select' in f ? f.select : f.column);

/** The columns of a table row, for reading rows into objects. */
export const FAILURE_COLUMNS = ROW_FIELDS.map((f) => `${sqlOf(f)} AS "${f.key}"`).join(', ');

/**
 * The same row as one `failure_table_row` value, for PostgreSQL to write as JSON with the
 * type's attribute names as keys. JSON has no NaN or infinity: those errors become null, as the
 * row reader's numbers do once stringified.
 */
export const FAILURE_ROW = `ROW(${ROW_FIELDS.map((f) => ('nonFiniteAsNull' in f ? `CASE WHEN ${sqlOf(f)} IN ('NaN', 'Infinity', '-Infinity') THEN NULL ELSE ${sqlOf(f)} END` : sqlOf(f))).join(', ')})::failure_table_row`;

/**
 * The WHERE, ORDER BY and parameters of one page of the failure table: filters become one
 * parameterised WHERE over indexed columns, and pages are keyed (never OFFSET), so page 1,000
 * costs what page 1 does. The LIMIT is the last parameter. Failures are aliased `f`.
 */
export function failureSearchSql(q: FailureQuery): { where: string; order: string; params: unknown[] } {
  const where: string[] = [];
  const params: unknown[] = [];
  const add = (sql: string, value: unknown) => {
    params.push(value);
    where.push(sql.replace('?', `$${params.length}`));
  };
  if (q.run) add('run_id = ?', q.run);
  if (q.suite) add('suite_slug = ?', q.suite);
  if (q.target) add('target_name = ?', q.target);
  if (q.convention) add('convention = ?', q.convention);
  if (q.fn)
    add(
      `suite_slug IN (SELECT s.slug FROM suites s JOIN suite_versions v ON v.suite_id = s.id WHERE v.body->>'subject' LIKE ? )`,
      `%${q.fn}(%`,
    );
  if (q.diagnosis === 'error' || q.diagnosis === 'skipped') add('outcome_kind = ?', q.diagnosis);
  else if (q.diagnosis) add('diagnosis_kind = ?', q.diagnosis);
  if (q.status === 'new') where.push('is_regression');
  if (q.status === 'known') where.push(`NOT is_regression AND NOT ${coveredByDeviationSql('f')}`);
  if (q.status === 'accepted') where.push(coveredByDeviationSql('f'));
  // Qualified: the select list names its text copy of the id "id" too, and ORDER BY would sort that as text.
  let order = 'f.id ASC';
  if (q.sort === 'ulps') {
    order = 'coalesce(f.ulps, 0) DESC, f.id ASC';
    if (q.after) {
      const [id, ulps] = q.after.split(':');
      params.push(Number(ulps ?? 0), id);
      where.push(
        `(coalesce(ulps, 0) < $${params.length - 1} OR (coalesce(ulps, 0) = $${params.length - 1} AND id > $${params.length}))`,
      );
    }
  } else if (q.after) add('id > ?', q.after.split(':')[0]);
  params.push(q.limit);
  return { where: where.length ? `WHERE ${where.join(' AND ')}` : '', order, params };
}
