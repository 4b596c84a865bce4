/**
 * The skip reasons of the shard `s` (shared/skip-reason.ts), summed over its paths' summaries,
 * most points first: a JSON array, empty for a shard with none or not done. Filtered by the run
 * as well as the shard, so `path_summaries_run_idx` finds the rows (there is no index by shard).
 */
export const SKIP_REASONS_SQL = `(
  SELECT coalesce(jsonb_agg(jsonb_strip_nulls(jsonb_build_object('reason', r.reason, 'count', r.count, 'lacks', r.lacks))
                            ORDER BY r.count DESC, r.reason), '[]'::jsonb)
    FROM (SELECT e->>'reason' AS reason, sum((e->>'count')::bigint) AS count, e->'lacks' AS lacks
            FROM path_summaries p CROSS JOIN LATERAL jsonb_array_elements(p.skipped) e
           WHERE p.run_id = s.run_id AND p.shard_id = s.id
           GROUP BY e->>'reason', e->'lacks') r)`;
