import { FAILURE_ROW_FIELDS } from '../../shared/failure-row-fields';
import type { FailureQuery } from '../../shared/schemas/failure-query';
import { DIAGNOSIS_CLASSES } from '../../shared/diagnosis-classes';
import { coveredByDeviationSql } from './covered-by-deviation-sql';
import { findingRankSql } from './finding-rank-sql';

/** A failure's place in the class order (branch first), as the page order and the rank indexes write it. */
export const RANK = findingRankSql('f.finding_class');

/** Newest first as an ascending key: the last column of the rank indexes (migration 1764960000000). */
export const NEWEST = '(-f.id)';

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
 * The rows, ORDER BY and parameters of one page of the failure table, branch findings first:
 * `from` is what a page reads (`SELECT … FROM ${from} ORDER BY ${order} LIMIT $<last>`), aliased
 * `f`. Filters become one parameterised WHERE over indexed columns, and pages are keyed (never
 * OFFSET), so page 1,000 costs what page 1 does. The LIMIT is the last parameter. `only`: one
 * failure by its number (the detail view).
 *
 * A label filter matches any label of a point, read as two halves, each limited to a page, then
 * merged: points whose leading label it is (the btree indexes on (run, leading kind, rank, …)
 * give them in page order) and points that carry it further down (`labels - 0`, the labels after
 * the first; PostgreSQL reads them through their GIN index or in page order, as its statistics
 * say). One containment test over every label read the index of the page order and filtered it,
 * since PostgreSQL cannot tell that a point's class follows from its labels: "inaccurate, by
 * ulps" walked every branch finding first, 942 ms a page over 300,000 points; as two halves,
 * 0.13 ms with no point carrying a second label and 0.9 ms with 37,500 carrying "inaccurate"
 * second, where "zero-sign" (none second) took 12.7 ms, the page-order walk PostgreSQL chose for
 * its later half (medians of 5 EXPLAIN ANALYZE, 2-core machine under load, 5 December 2026).
 */
export function failureSearchSql(q: FailureQuery, only?: string): { from: string; order: string; params: unknown[] } {
  const where: string[] = [];
  const params: unknown[] = [];
  const add = (sql: string, value: unknown) => {
    params.push(value);
    where.push(sql.replace('?', `$${params.length}`));
  };
  if (only !== undefined) add('id = ?', only);
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
  // The class as its rank: the same expression as the page order, so one index serves both.
  if (q.class) add(`${RANK} = ?`, DIAGNOSIS_CLASSES.indexOf(q.class));
  if (q.status === 'new') where.push('is_regression');
  if (q.status === 'known') where.push(`NOT is_regression AND NOT ${coveredByDeviationSql('f')}`);
  if (q.status === 'accepted') where.push(coveredByDeviationSql('f'));
  // Branch findings first, then accuracy findings, then errors and skipped points, each newest
  // first; keyed pages carry the last row's rank. Newest first is `-id` ascending, the rank
  // indexes' last column, so the next page is one row comparison the index answers.
  // Qualified: the select list names its text copy of the id "id" too, and ORDER BY would sort that as text.
  let order = `${RANK} ASC, ${NEWEST} ASC`;
  const [afterId, afterRank, afterUlps] = q.after?.split(':') ?? [];
  if (q.sort === 'ulps') {
    // Equal errors newest first too (migration 1764970000000): every branch finding ties at 0.
    order = `${RANK} ASC, coalesce(f.ulps, 0) DESC, ${NEWEST} ASC`;
    if (q.after) {
      params.push(Number(afterRank), Number(afterUlps ?? 0), afterId);
      const [r, u, id] = [params.length - 2, params.length - 1, params.length].map((n) => `$${n}`);
      where.push(
        `(${RANK} > ${r} OR (${RANK} = ${r} AND (coalesce(ulps, 0) < ${u} OR (coalesce(ulps, 0) = ${u} AND (-id) > -${id}::bigint))))`,
      );
    }
  } else if (q.after) {
    params.push(Number(afterRank), afterId);
    where.push(`(${RANK}, ${NEWEST}) > ($${params.length - 1}, -$${params.length}::bigint)`);
  }
  const label = q.diagnosis && q.diagnosis !== 'error' && q.diagnosis !== 'skipped' ? q.diagnosis : null;
  let from: string;
  if (label) {
    params.push(label);
    const kind = `$${params.length}`;
    const limit = `$${params.length + 1}`;
    const half = (test: string) =>
      `(SELECT * FROM failures f WHERE ${[...where, test].join(' AND ')} ORDER BY ${order} LIMIT ${limit})`;
    from = `(${half(`diagnosis_kind = ${kind}`)} UNION ALL ${half(
      `(labels - 0) @> jsonb_build_array(jsonb_build_object('kind', ${kind}::text)) AND diagnosis_kind IS DISTINCT FROM ${kind}`,
    )}) f`;
  } else from = `failures f${where.length ? ` WHERE ${where.join(' AND ')}` : ''}`;
  params.push(q.limit);
  return { from, order, params };
}
