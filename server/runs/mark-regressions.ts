import { createHash } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import { Run } from '../entities/run';
import { coveredByDeviationSql } from '../sql/covered-by-deviation-sql';
import type { MailOutbox } from '../mail/mail-outbox';
import type { ClassCounts } from '../../shared/run-result';
import { findingRankSql } from '../sql/finding-rank-sql';
import { regressionMail } from './regression-mail';
import { REGRESSION_MAIL_ROWS } from './regression-mail-rows';
import type { DiagnosisKind } from '../../shared/diagnosis';
import type { RegressionRow } from './regression-row';
import { targetKeySql } from '../sql/target-key-sql';
import { writeRegressionGroups } from './write-regression-groups';
import { newlyStoppedChecks } from './newly-stopped-checks';

/**
 * Completes a run: marks as regressions the failing points that passed in the previous
 * completed run of the same plan — the same suite, path and input bits, on the same target
 * up to its version, on a path that run evaluated without a path error, and not covered by an
 * unexpired accepted deviation — and queues one mail, branch regressions first, to the plan's recipients and the
 * subscribers of the libraries that regressed, when there are any. Runs inside the caller's transaction.
 */
export async function markRegressions(
  tx: EntityManager,
  runId: string,
  mail: { outbox: MailOutbox; appUrl: string },
): Promise<number> {
  const run = await tx.getRepository(Run).findOneOrFail({ where: { id: runId }, relations: { plan: true } });
  const previous = run.plan
    ? await tx
        .getRepository(Run)
        .createQueryBuilder('r')
        .where('r.plan_id = :plan AND r.status = :done AND r.created_at < :at AND r.id <> :id', {
          plan: run.plan.id,
          done: 'completed',
          at: run.createdAt,
          id: run.id,
        })
        .orderBy('r.created_at', 'DESC')
        .getOne()
    : null;
  let count = 0;
  if (previous) {
    // Counted through a CTE: TypeORM answers a bare UPDATE … RETURNING with [rows, affected].
    const [marked] = await tx.query(
      `WITH marked AS (UPDATE failures f SET is_regression = true
        WHERE f.run_id = $1 AND f.outcome_kind = 'fail'
          AND EXISTS (SELECT 1 FROM shards ps JOIN path_summaries pp ON pp.shard_id = ps.id
                       WHERE ps.run_id = $2 AND ps.suite_slug = f.suite_slug AND ${targetKeySql('ps.target_name')} = ${targetKeySql('f.target_name')}
                         AND pp.path_name = f.path_name AND pp.error IS NULL)
          AND NOT EXISTS (SELECT 1 FROM failures pf
                           WHERE pf.run_id = $2 AND pf.point_key = f.point_key AND ${targetKeySql('pf.target_name')} = ${targetKeySql('f.target_name')})
          AND NOT ${coveredByDeviationSql('f')}
        RETURNING f.id) SELECT count(*)::int AS n FROM marked`,
      [run.id, previous.id],
    );
    count = marked.n;
    // The Overview's counts (entities/regression-group.ts), written with the marks they count.
    if (count > 0) await writeRegressionGroups(tx, run.id);
  }
  // Checks judged last time and stopped by an error now regress no point, yet are news: mailed too.
  const stopped = previous ? await newlyStoppedChecks(tx, run.id, previous.id) : [];
  const stoppedKeys = [...new Set(stopped.map((c) => c.targetKey))];
  // No completed run to compare with (the plan's first to complete): regressions stay null, so
  // every screen says "first run of this plan to complete" rather than "0 since the previous".
  await tx
    .getRepository(Run)
    .update(run.id, { status: 'completed', finishedAt: new Date(), regressions: previous ? count : null });
  // The plan's recipients, and everyone subscribed to a library that regressed or whose check stopped.
  const subscribers: { email: string }[] =
    count > 0 || stopped.length > 0
      ? await tx.query(
          `SELECT DISTINCT u.email FROM subscriptions s JOIN users u ON u.id = s.user_id
            WHERE s.target_key IN (SELECT DISTINCT ${targetKeySql('target_name')} FROM failures WHERE run_id = $1 AND is_regression)
               OR s.target_key = ANY($2::text[])`,
          [run.id, stoppedKeys],
        )
      : [];
  const recipients = [...new Set([...(run.plan?.recipients ?? []), ...subscribers.map((s) => s.email)])];
  if ((count > 0 || stopped.length > 0) && recipients.length > 0) {
    const rows: RegressionRow[] = (
      await tx.query(
        `SELECT id::text, suite_slug, target_name, path_name, z, z_hex, expected, actual, diagnosis, labels, finding_class,
                rule, reproducer, steps, first_left_step, choice,
                count(*) OVER (PARTITION BY finding_class, suite_slug, target_name)::int AS group_total
           FROM failures f WHERE run_id = $1 AND is_regression
          ORDER BY ${findingRankSql('f.finding_class')}, group_total DESC, suite_slug, target_name, path_name, point_index
          LIMIT ${REGRESSION_MAIL_ROWS}`,
        [run.id],
      )
    ).map((r: Record<string, unknown>) => ({
      id: r.id,
      suiteSlug: r.suite_slug,
      targetName: r.target_name,
      pathName: r.path_name,
      z: r.z,
      zHex: r.z_hex,
      expected: r.expected,
      actual: r.actual,
      diagnosis: r.diagnosis,
      labels: r.labels,
      findingClass: r.finding_class,
      rule: r.rule,
      reproducer: r.reproducer,
      steps: r.steps,
      firstLeftStep: r.first_left_step,
      choice: r.choice,
      groupTotal: r.group_total,
    })) as RegressionRow[];
    const [byClass]: ClassCounts[] = await tx.query(
      `SELECT count(*) FILTER (WHERE finding_class = 'branch')::int AS branch,
              count(*) FILTER (WHERE finding_class = 'accuracy')::int AS accuracy
         FROM failures WHERE run_id = $1 AND is_regression`,
      [run.id],
    );
    // Each regression under every kind it carries, the way the failure table's diagnosis filter
    // matches (the leading kind, or any later label: server/sql/failure-search-sql.ts), so the
    // mail's count of a kind is the number of rows its link shows.
    const byKind: Partial<Record<DiagnosisKind, number>> = Object.fromEntries(
      (
        await tx.query(
          `SELECT k.kind, count(*)::int AS n
             FROM failures f CROSS JOIN LATERAL (
                    SELECT f.diagnosis_kind AS kind WHERE f.diagnosis_kind IS NOT NULL
                    UNION SELECT l->>'kind' FROM jsonb_array_elements(f.labels - 0) l) k
            WHERE f.run_id = $1 AND f.is_regression
            GROUP BY k.kind`,
          [run.id],
        )
      ).map((r: { kind: DiagnosisKind; n: number }) => [r.kind, r.n]),
    );
    // Every target of the run with regressions (a plan names a handful); the summary names the first few.
    const targets: { name: string; count: number }[] = await tx.query(
      `SELECT target_name AS name, count(*)::int AS count FROM failures WHERE run_id = $1 AND is_regression
        GROUP BY target_name ORDER BY count DESC, target_name`,
      [run.id],
    );
    const versionChanges: { key: string; from: string; to: string }[] = previous
      ? await tx.query(
          `SELECT DISTINCT ${targetKeySql('s.target_name')} AS key, p.target_version AS "from", s.target_version AS "to"
             FROM shards s JOIN shards p ON p.run_id = $2 AND ${targetKeySql('p.target_name')} = ${targetKeySql('s.target_name')}
            WHERE s.run_id = $1 AND p.target_version <> s.target_version ORDER BY key`,
          [run.id, previous.id],
        )
      : [];
    // The same regressions against the same baseline are mailed once, whichever run found them
    // (issue 11: two runs of one plan both mailed the same regression).
    const [{ digest }] = await tx.query(
      `SELECT md5(string_agg(${targetKeySql('target_name')} || '|' || point_key, ',' ORDER BY ${targetKeySql('target_name')}, point_key)) AS digest
         FROM failures WHERE run_id = $1 AND is_regression`,
      [run.id],
    );
    await mail.outbox.enqueue(
      regressionMail({
        recipients,
        planName: run.planName,
        runId: run.id,
        appUrl: mail.appUrl,
        rows,
        total: count,
        byClass: byClass!,
        byKind,
        targets,
        versionChanges,
        stopped,
        // The stopped checks are part of what is news, so a second run with the same ones is not mailed again.
        idempotencyKey: `regressions:${run.plan?.id ?? run.planName}:${previous?.id ?? 'none'}:${digest}${
          stopped.length > 0
            ? `:stopped:${createHash('md5')
                .update(stopped.map((c) => `${c.suite}|${c.targetKey}`).join(','))
                .digest('hex')}`
            : ''
        }`,
      }),
      tx,
    );
  }
  return count;
}
