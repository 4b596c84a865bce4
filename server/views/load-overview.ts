import { In, type DataSource } from 'typeorm';
import type { OverviewView, WaitingRegression, WaitingSuite } from '../../shared/overview-view';
import { Run } from '../entities/run';
import type { User } from '../entities/user';
import { branchKindSql } from '../sql/branch-kind-sql';
import { coveredByDeviationSql } from '../sql/covered-by-deviation-sql';
import { targetKeySql } from '../sql/target-key-sql';
import type { OverviewMemo } from './overview-memo';
import { loadRunComparisons } from './load-run-comparisons';
import { toRunView } from './to-run-view';
import { waitingTargets } from '../runs/waiting-targets';

const RUN_RELATIONS = { plan: true, requestedBy: true } as const;

/**
 * A regression group (regression_groups, aliased g) matched against deviations scoped to a suite,
 * path or diagnosis. Point-scoped deviations are subtracted apart (point_covered below), found
 * from the deviations' point keys through failures_point_key_idx. Counting the failures
 * themselves read every regressed row: 20,000 regressions over 1,000,000 failing points took
 * 235–340 ms a request alone (EXPLAIN ANALYZE: 16,754 heap pages for the index scan of
 * failures_run_new_idx) and made the Overview's p95 3.5–5 s under 50 clients.
 */
const GROUP_MATCH = {
  targetKey: 'g.target_key',
  targetVersion: 'g.target_version',
  suiteSlug: 'g.suite_slug',
  pathName: 'g.path_name',
  pointKey: null,
  diagnosisKind: 'g.diagnosis_kind',
};
/** The runs in progress the screen lists; more than this are on the Runs screen. */
const IN_PROGRESS_LIMIT = 20;

/** The newest version of every suite, with who wrote it and who reviewed it, filtered by `where` over `v`. */
const waitingSql = (where: string) => `
  SELECT s.slug, v.version, v.body->>'title' AS title, v.body->>'subject' AS subject, a.display_name AS "authorName",
         coalesce(v.reviewed_at, v.submitted_at, v.created_at) AS since, r.display_name AS "reviewerName", v.review_comment AS "reviewComment"
    FROM suites s
    JOIN LATERAL (SELECT * FROM suite_versions x WHERE x.suite_id = s.id ORDER BY x.version DESC LIMIT 1) v ON true
    JOIN users a ON a.id = v.author_id
    LEFT JOIN users r ON r.id = v.reviewer_id
   WHERE ${where}
   ORDER BY since ASC, s.slug`;

const toWaiting = (row: Omit<WaitingSuite, 'since'> & { since: Date }): WaitingSuite => ({
  ...row,
  since: new Date(row.since).toISOString(),
});

/**
 * The Overview in one answer, so the screen makes one round trip: the latest completed run of
 * every plan (compared with the completed one before it) and any newer run, the runs in progress, and what waits on the
 * caller — suites to review (reviewers and admins), their own suites sent back, and regressions
 * in the latest completed run of each plan that mails them (its mail list names them) or on
 * the libraries they subscribe to.
 *
 * With `memo` (the router's), the parts that are the same for everyone — the plans and runs,
 * the review queue, and the regressions of one set of subscriptions and mailing plans — are shared for
 * a second (overview-memo.ts), one computation at a time, and so is each caller's whole
 * answer. Under 50 clients the eight queries of each request queued on the
 * database pool (p95 1,086 ms with the counts of regression_groups, each query 0.5–6 ms alone).
 */
export async function loadOverview(dataSource: DataSource, user: User, memo?: OverviewMemo): Promise<OverviewView> {
  // The caller's own answer is shared too, for their next request within the second.
  return memo
    ? memo.shared(`view|${user.id}|${user.role}`, () => compute(dataSource, user, memo))
    : compute(dataSource, user);
}

async function compute(dataSource: DataSource, user: User, memo?: OverviewMemo): Promise<OverviewView> {
  const shared = <T>(key: string, compute: () => Promise<T>): Promise<T> =>
    memo ? memo.shared(key, compute) : compute();
  const canReview = user.role === 'reviewer' || user.role === 'admin';
  const [runsPart, reviewQueue, changesRequested, subscriptions, mailPlans] = await Promise.all([
    shared('runs', () => loadRuns(dataSource)),
    canReview
      ? shared('review-queue', async () =>
          (await dataSource.query(waitingSql(`v.status = 'submitted'`))).map(toWaiting),
        )
      : null,
    dataSource
      .query(waitingSql(`v.status = 'changes-requested' AND v.author_id = $1`), [user.id])
      .then((rows: Parameters<typeof toWaiting>[0][]) => rows.map(toWaiting)),
    dataSource
      .query(`SELECT target_key FROM subscriptions WHERE user_id = $1 ORDER BY target_key`, [user.id])
      .then((rows: { target_key: string }[]) => rows.map((r) => r.target_key)),
    // The plans that mail the caller their regressions (markRegressions mails a plan's recipients).
    dataSource.query(
      `SELECT id, name FROM plans WHERE lower($1) IN (SELECT lower(r) FROM unnest(recipients) AS r) ORDER BY name`,
      [user.email],
    ) as Promise<{ id: string; name: string }[]>,
  ]);
  const regressions =
    subscriptions.length || mailPlans.length
      ? await shared(`regressions|${JSON.stringify([subscriptions, mailPlans.map((p) => p.id)])}`, () =>
          loadRegressions(
            dataSource,
            subscriptions,
            mailPlans.map((p) => p.id),
          ),
        )
      : [];
  return {
    ...runsPart,
    needsMe: { reviewQueue, changesRequested, subscriptions, mailPlans: mailPlans.map((p) => p.name), regressions },
  };
}

/**
 * Every plan's latest completed run with its comparison, a newer run that has not completed,
 * and the runs in progress. The completed run and the one before it are the pair markRegressions
 * compared (completed, created earlier), so the counts and the regressions tell one story.
 */
async function loadRuns(dataSource: DataSource): Promise<Pick<OverviewView, 'plans' | 'inProgress'>> {
  const plans: {
    id: string;
    name: string;
    completed: string | null;
    previous: string | null;
    previousFinishedAt: Date | null;
    newer: string | null;
  }[] = await dataSource.query(
    `SELECT p.id, p.name, completed.id AS completed, previous.id AS previous, previous.finished_at AS "previousFinishedAt",
            newer.id AS newer
       FROM plans p
       LEFT JOIN LATERAL (SELECT r.id, r.created_at FROM runs r WHERE r.plan_id = p.id AND r.status = 'completed'
                           ORDER BY r.created_at DESC LIMIT 1) completed ON true
       LEFT JOIN LATERAL (SELECT r.id, r.finished_at FROM runs r WHERE r.plan_id = p.id AND r.status = 'completed'
                             AND r.created_at < completed.created_at
                           ORDER BY r.created_at DESC LIMIT 1) previous ON true
       LEFT JOIN LATERAL (SELECT r.id, r.created_at FROM runs r WHERE r.plan_id = p.id AND r.status <> 'completed'
                             AND (completed.created_at IS NULL OR r.created_at > completed.created_at)
                           ORDER BY r.created_at DESC LIMIT 1) newer ON true
      ORDER BY greatest(completed.created_at, newer.created_at) DESC NULLS LAST, p.name`,
  );
  const runIds = plans.flatMap((p) => [p.completed, p.newer]).filter((id): id is string => id !== null);
  const runs = runIds.length
    ? await dataSource.getRepository(Run).find({ where: { id: In(runIds) }, relations: RUN_RELATIONS })
    : [];
  const byId = new Map(runs.map((r) => [r.id, r]));
  const comparisons = await loadRunComparisons(
    dataSource,
    plans.flatMap((p) =>
      p.completed && p.previous
        ? [
            {
              latest: p.completed,
              previous: { id: p.previous, finishedAt: p.previousFinishedAt?.toISOString() ?? null },
            },
          ]
        : [],
    ),
  );

  const inProgress = await dataSource.getRepository(Run).find({
    where: { status: In(['queued', 'running']) },
    relations: RUN_RELATIONS,
    order: { createdAt: 'DESC' },
    take: IN_PROGRESS_LIMIT,
  });
  // A plan's newer run may be live but older than the newest IN_PROGRESS_LIMIT: it waits as well.
  const newerRuns = plans.flatMap((p) => (p.newer && byId.get(p.newer)) || []);
  const waiting = await waitingTargets(dataSource, [...inProgress, ...newerRuns]);

  return {
    plans: plans.map((p) => {
      const completed = p.completed ? byId.get(p.completed) : undefined;
      const newer = p.newer ? byId.get(p.newer) : undefined;
      return {
        planId: p.id,
        planName: p.name,
        // A finished run's pairs wait for nothing.
        completed: completed ? toRunView(completed, []) : null,
        comparison: (p.completed && comparisons.get(p.completed)) || null,
        newer: newer ? toRunView(newer, waiting.get(newer.id) ?? []) : null,
      };
    }),
    inProgress: inProgress.map((r) => toRunView(r, waiting.get(r.id) ?? [])),
  };
}

/**
 * Regressions in the latest completed run of each plan whose mail `mailPlans` names (all its
 * libraries, one row per run), and on the libraries `subscriptions` names in the other plans
 * (one row per run and library): what the regression mail told the caller about, less what an
 * accepted deviation covers.
 */
async function loadRegressions(
  dataSource: DataSource,
  subscriptions: string[],
  mailPlans: string[],
): Promise<WaitingRegression[]> {
  return (
    await dataSource.query(
      `WITH latest AS (SELECT DISTINCT ON (plan_id) id, plan_id, plan_name, finished_at FROM runs
                            WHERE plan_id IS NOT NULL AND status = 'completed' ORDER BY plan_id, created_at DESC),
           open_groups AS (SELECT g.*, l.plan_id = ANY($2::uuid[]) AS by_mail
                             FROM latest l JOIN regression_groups g ON g.run_id = l.id
                            WHERE (g.target_key = ANY($1) OR l.plan_id = ANY($2::uuid[]))
                              AND NOT ${coveredByDeviationSql('g', GROUP_MATCH)}),
           point_covered AS (SELECT o.run_id, o.target_key, count(*)::int AS n,
                                    count(*) FILTER (WHERE ${branchKindSql('f.diagnosis_kind')})::int AS b
                               FROM failures f
                               JOIN open_groups o ON o.run_id = f.run_id AND o.target_key = ${targetKeySql('f.target_name')}
                                AND o.target_version = f.target_version
                                AND o.suite_slug = f.suite_slug AND o.path_name = f.path_name
                                AND o.diagnosis_kind IS NOT DISTINCT FROM f.diagnosis_kind
                              WHERE f.point_key IN (SELECT d.point_key FROM deviations d WHERE d.scope = 'point')
                                AND f.is_regression AND ${coveredByDeviationSql('f')}
                              GROUP BY 1, 2),
           totals AS (SELECT run_id, target_key, bool_or(by_mail) AS by_mail, sum(count)::int AS n,
                             coalesce(sum(count) FILTER (WHERE ${branchKindSql('diagnosis_kind')}), 0)::int AS b
                        FROM open_groups GROUP BY 1, 2),
           open_counts AS (SELECT t.run_id, CASE WHEN t.by_mail THEN NULL ELSE t.target_key END AS target_key,
                                  sum(t.n - coalesce(p.n, 0))::int AS n, sum(t.b - coalesce(p.b, 0))::int AS b
                             FROM totals t
                             LEFT JOIN point_covered p ON p.run_id = t.run_id AND p.target_key = t.target_key
                            GROUP BY 1, 2)
           SELECT c.target_key AS "targetKey", l.id AS "runId", l.plan_name AS "planName", l.finished_at AS "finishedAt",
                  c.n AS count, c.b AS branch
             FROM open_counts c JOIN latest l ON l.id = c.run_id
            WHERE c.n > 0
            ORDER BY l.finished_at DESC, c.target_key NULLS FIRST`,
      [subscriptions, mailPlans],
    )
  ).map((r: Omit<WaitingRegression, 'finishedAt'> & { finishedAt: Date }) => ({
    ...r,
    finishedAt: new Date(r.finishedAt).toISOString(),
  }));
}
