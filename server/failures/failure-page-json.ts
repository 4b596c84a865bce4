import { createHash } from 'node:crypto';
import type { Pool } from 'pg';
import type { DataSource } from 'typeorm';
import type { FailureQuery } from '../../shared/schemas/failure-query';
import { deviationAppliesSql } from '../sql/deviation-applies-sql';
import { FAILURE_ROW, failureSearchSql, RANK } from '../sql/failure-search-sql';
import { failureMatchSql } from '../sql/failure-match-sql';

/**
 * The decision in force that covers each row of a page (shared/decision-mark.ts), keyed by failure
 * number: one lookup per row through deviations_match_idx (library, suite) after the page is chosen,
 * so the page's order and indexes are as before. Measured on 5 December 2026 (pages of 50 over
 * 200,000 failures, median of 41 pages, load average 14–19 on the 2-core machine): 1.2–2.2 ms a
 * page without deviations, 1.8–4.8 ms with 30 on the page's suites, whichever their versions rule.
 */
const DECISION_MARKS = `(SELECT coalesce(json_object_agg(m.fid, m.mark), '{}'::json) FROM (
       SELECT f.id::text AS fid, json_build_object('id', d.id, 'classification', d.classification, 'expiresAt',
                                  to_char(d.expires_at AT TIME ZONE 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"')) AS mark
         FROM p JOIN failures f ON f.id = p._id
         JOIN LATERAL (SELECT * FROM deviations d
                        WHERE d.revoked_at IS NULL AND (d.expires_at IS NULL OR d.expires_at > now())
                          AND ${deviationAppliesSql('d', failureMatchSql('f'))}
                        ORDER BY d.classification = 'accepted' DESC, d.created_at DESC LIMIT 1) d ON true) m)`;

/**
 * One page of the failure table as the response body `{"failures": [...], "next": ..., "decisions": {...}}`,
 * written by PostgreSQL: the server passes the text on without parsing rows into objects and
 * stringifying them again. Measured with `BENCH_TABLE_ONLY=1 npm run bench:server` (50
 * concurrent clients, 1,000,000 failing points, 2-core machine): that parse-and-stringify was
 * about a fifth of the server's time per request. The rows and the cursor are the ones
 * `searchFailures` gives (a test compares them).
 */
export async function failurePageJson(dataSource: DataSource, q: FailureQuery): Promise<string> {
  const { from, order, params } = failureSearchSql(q);
  const byUlps = q.sort === 'ulps';
  // The page order of failureSearchSql, and its reverse to find the cursor's row: newest first
  // within a class, and within equal errors when sorted by ulps.
  const pageOrder = byUlps ? 'p._r ASC, p._u DESC, p._id DESC' : 'p._r ASC, p._id DESC';
  const lastFirst = byUlps ? 'p._r DESC, p._u ASC, p._id ASC' : 'p._r DESC, p._id ASC';
  const cursor = `p._id::text || ':' || p._r::text${byUlps ? ` || ':' || p._u::text` : ''}`;
  const text = `WITH p AS (
       SELECT f.id AS _id, ${RANK} AS _r, coalesce(f.ulps, 0) AS _u, ${FAILURE_ROW} AS r
         FROM ${from} ORDER BY ${order} LIMIT $${params.length})
     SELECT json_build_object(
              'failures', coalesce(json_agg(p.r ORDER BY ${pageOrder}), '[]'::json),
              'next', CASE WHEN count(*) = $${params.length} THEN (array_agg(${cursor} ORDER BY ${lastFirst}))[1] END,
              'decisions', ${DECISION_MARKS}
            )::text AS body
       FROM p`;
  // A named statement on TypeORM's own pool, so each filter shape is parsed and planned once per
  // connection: PostgreSQL's CPU per page fell from 1.0 to 0.8 ms (2,000 requests, measured from
  // the postmaster's child CPU time), and the table served 600–613 instead of 572 requests/s.
  const pool = (dataSource.driver as unknown as { master: Pool }).master;
  const name = `failure-page-${createHash('sha1').update(text).digest('hex').slice(0, 16)}`;
  const result = await pool.query<{ body: string }>({ name, text, values: params });
  return result.rows[0]!.body;
}
