import type { DataSource } from 'typeorm';
import type { DiagnosisKind } from '../../shared/diagnosis';
import { DIAGNOSIS_KINDS } from '../../shared/diagnosis-kinds';
import type { FindingsByKindView } from '../../shared/findings-by-kind-view';
import { HttpError } from '../http/http-error';

/**
 * A plan's findings by kind across its latest `limit` completed runs (oldest first), summed in
 * PostgreSQL from each shard's `by_diagnosis` (every label of every failing point, counted when
 * the shard was stored), so no failure row is read: the plan's runs through
 * runs_plan_created_idx and their shards through shards_run_idx. Cancelled and failed runs are
 * left out, since they checked only part of the plan and would read as a drop. 404 when no plan
 * has that id.
 */
export async function loadFindingsByKind(
  dataSource: DataSource,
  planId: string,
  limit: number,
): Promise<FindingsByKindView> {
  const rows: {
    id: string;
    createdAt: Date;
    finishedAt: Date | null;
    failed: number;
    checksStopped: number;
    byKind: Record<string, number>;
  }[] = await dataSource.query(
    `SELECT r.id::text AS id, r.created_at AS "createdAt", r.finished_at AS "finishedAt",
              coalesce((r.counts->>'fail')::int, 0) AS failed, r.checks_stopped AS "checksStopped",
              coalesce((SELECT jsonb_object_agg(k.kind, k.n)
                          FROM (SELECT d.key AS kind, sum(d.value::int)::int AS n
                                  FROM shards s CROSS JOIN LATERAL jsonb_each_text(s.by_diagnosis) d
                                 WHERE s.run_id = r.id AND jsonb_typeof(s.by_diagnosis) = 'object'
                                 GROUP BY d.key) k), '{}'::jsonb) AS "byKind"
         FROM (SELECT id, created_at, finished_at, counts, checks_stopped FROM runs
                WHERE plan_id = $1 AND status = 'completed'
                ORDER BY created_at DESC LIMIT $2) r
        ORDER BY r.created_at ASC, r.id ASC`,
    [planId, limit],
  );
  if (rows.length === 0) {
    const [plan] = await dataSource.query(`SELECT 1 FROM plans WHERE id = $1`, [planId]);
    if (!plan) throw new HttpError(404, { kind: 'not-found', message: 'No plan with that id.' });
  }
  return {
    runs: rows.map((r) => ({
      id: r.id,
      createdAt: r.createdAt.toISOString(),
      finishedAt: r.finishedAt?.toISOString() ?? null,
      failed: r.failed,
      checksStopped: r.checksStopped,
      byKind: Object.fromEntries(DIAGNOSIS_KINDS.map((k) => [k, r.byKind[k] ?? 0])) as Record<DiagnosisKind, number>,
    })),
    limit,
  };
}
