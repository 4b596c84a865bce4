import { In, type DataSource } from 'typeorm';
import type { RunTrigger } from '../../shared/run-status';
import type { RunListQuery } from '../../shared/schemas/run-list-query';
import type { RunView } from '../../shared/run-view';
import { Plan } from '../entities/plan';
import { Run } from '../entities/run';
import { Shard } from '../entities/shard';
import { SuiteVersion } from '../entities/suite-version';
import type { User } from '../entities/user';
import { HttpError } from '../http/http-error';
import type { ShardQueue } from './shard-queue';
import { toRunView } from '../views/to-run-view';
import { waitingTargets } from './waiting-targets';

const RUN_RELATIONS = { plan: true, requestedBy: true } as const;

/**
 * Starting, reading and cancelling runs. A run takes each plan suite's newest approved version
 * at the moment it starts (recorded per shard) and every installed target of the plan; one
 * shard per suite × target goes onto the queue once the run is committed.
 */
export class RunService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly queue: ShardQueue,
  ) {}

  /**
   * Starts a run of the plan, or returns the plan's run that is queued or running already
   * (`existing: true`): two "Run now" at once, from two sessions or a double click, make one run.
   * The plan row is locked first, so the second request waits for the first to commit and then
   * finds its run; the unique index `runs_one_active_per_plan` holds the rule even for a writer
   * that skips this lock.
   */
  async start(planId: string, trigger: RunTrigger, user: User | null): Promise<{ run: RunView; existing: boolean }> {
    type Started = { existingId: string } | { run: Run; shardIds: string[] };
    const started = await this.dataSource.transaction(async (tx): Promise<Started> => {
      const [lockedPlan] = await tx.query(`SELECT id FROM plans WHERE id = $1 FOR NO KEY UPDATE`, [planId]);
      if (!lockedPlan) throw new HttpError(404, { kind: 'not-found', message: 'No plan with that id.' });
      const [active] = await tx.query(`SELECT id FROM runs WHERE plan_id = $1 AND status IN ('queued', 'running')`, [
        planId,
      ]);
      if (active) return { existingId: active.id as string };
      const plan = await tx
        .getRepository(Plan)
        .findOne({ where: { id: planId }, relations: { suites: true, targets: true } });
      if (!plan) throw new HttpError(404, { kind: 'not-found', message: 'No plan with that id.' });
      // Each suite's newest approved version, in one query rather than one per suite.
      const newest: { id: string }[] = plan.suites.length
        ? await tx.query(
            `SELECT DISTINCT ON (suite_id) id FROM suite_versions WHERE suite_id = ANY($1) AND status = 'approved' ORDER BY suite_id, version DESC`,
            [plan.suites.map((x) => x.id)],
          )
        : [];
      const versions = newest.length
        ? await tx.getRepository(SuiteVersion).find({
            where: { id: In(newest.map((v) => v.id)) },
            relations: { suite: true },
            order: { suite: { slug: 'ASC' } },
          })
        : [];
      const targets = plan.targets.filter((t) => t.installed);
      if (versions.length === 0 || targets.length === 0) {
        throw new HttpError(409, {
          kind: 'conflict',
          message: `Plan "${plan.name}" has nothing to run: ${versions.length} approved suite(s), ${targets.length} installed target(s).`,
        });
      }
      const run = await tx.getRepository(Run).save(
        tx.getRepository(Run).create({
          plan,
          planName: plan.name,
          trigger,
          requestedBy: user,
          status: 'queued',
          shardsTotal: versions.length * targets.length,
          shardsDone: 0,
          counts: { pass: 0, fail: 0, error: 0, skipped: 0, notApplicable: 0 },
          byClass: { branch: 0, accuracy: 0 },
          checksStopped: 0,
          checksFailed: 0,
          regressions: null,
        }),
      );
      const shards = await tx.getRepository(Shard).save(
        versions.flatMap((v) =>
          targets.map((t) =>
            tx.getRepository(Shard).create({
              run,
              suiteVersion: v,
              suiteSlug: v.suite.slug,
              targetName: t.name,
              targetLibrary: t.library,
              targetVersion: t.version,
              status: 'queued',
              outcome: null,
              attempts: 0,
              errors: [],
            }),
          ),
        ),
      );
      return { run, shardIds: shards.map((s) => s.id) };
    });
    if ('existingId' in started) return { run: await this.get(started.existingId), existing: true };
    await this.queue.enqueue(started.shardIds);
    return { run: await this.get(started.run.id), existing: false };
  }

  async get(id: string): Promise<RunView> {
    const run = await this.dataSource.getRepository(Run).findOne({ where: { id }, relations: RUN_RELATIONS });
    if (!run) throw noRun();
    return toRunView(run, (await waitingTargets(this.dataSource, [run])).get(run.id) ?? []);
  }

  /**
   * Answers 404 unless the run exists: for the run page's matrix and properties, polled every few
   * seconds while a run is live, which need no view of the run (get's relations and waiting targets).
   */
  async assertExists(id: string): Promise<void> {
    if (!(await this.dataSource.getRepository(Run).existsBy({ id }))) throw noRun();
  }

  /**
   * Newest first, filtered; one page of `limit` keyed by the last run of the previous page, so
   * an old page costs what the first one does. `next` is the cursor of the following page.
   */
  async list(query: Partial<RunListQuery> = {}): Promise<{ runs: RunView[]; next: string | null }> {
    const limit = query.limit ?? 50;
    const qb = this.dataSource
      .getRepository(Run)
      .createQueryBuilder('r')
      .leftJoinAndSelect('r.plan', 'plan')
      .leftJoinAndSelect('r.requestedBy', 'requestedBy')
      .orderBy('r.createdAt', 'DESC')
      .addOrderBy('r.id', 'DESC')
      // Both joins are many-to-one, so a plain LIMIT cannot cut a run's rows in half.
      .limit(limit + 1);
    if (query.plan) qb.andWhere('r.plan_id = :plan', { plan: query.plan });
    if (query.status) qb.andWhere('r.status = :status', { status: query.status });
    if (query.trigger) qb.andWhere('r.trigger = :trigger', { trigger: query.trigger });
    if (query.before) {
      qb.andWhere('(r.created_at, r.id) < (SELECT b.created_at, b.id FROM runs b WHERE b.id = :before)', {
        before: query.before,
      });
    }
    const rows = await qb.getMany();
    const page = rows.slice(0, limit);
    const waiting = await waitingTargets(this.dataSource, page);
    return {
      runs: page.map((r) => toRunView(r, waiting.get(r.id) ?? [])),
      next: rows.length > limit ? page[page.length - 1]!.id : null,
    };
  }

  /** Cancels a queued or running run: shards not yet done are skipped; a shard in flight stops at its next path. */
  async cancel(id: string): Promise<RunView> {
    await this.dataSource.transaction(async (tx) => {
      const [locked] = await tx.query(`SELECT id FROM runs WHERE id = $1 FOR NO KEY UPDATE`, [id]);
      const run = locked ? await tx.getRepository(Run).findOneBy({ id }) : null;
      if (!run) throw noRun();
      if (run.status !== 'queued' && run.status !== 'running')
        throw new HttpError(409, { kind: 'conflict', message: `The run is ${run.status} already.` });
      await tx.getRepository(Run).update(id, { status: 'cancelled', finishedAt: new Date() });
      await tx.query(`UPDATE shards SET status = 'cancelled' WHERE run_id = $1 AND status IN ('queued', 'running')`, [
        id,
      ]);
    });
    return this.get(id);
  }
}

const noRun = () => new HttpError(404, { kind: 'not-found', message: 'No run with that id.' });
