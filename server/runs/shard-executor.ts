import type { DataSource, EntityManager } from 'typeorm';
import { evaluatePair, ReferenceCache, type Target } from '../../harness';
import { checkStoppedByError } from '../../shared/check-stopped-by-error';
import { FAILURE_ROW_FIELDS } from '../../shared/failure-row-fields';
import type { DiagnosisClass } from '../../shared/diagnosis-class';
import type { OutcomeCounts, PointFinding, SuiteTargetResult } from '../../shared/run-result';
import { Failure } from '../entities/failure';
import { PathSummary } from '../entities/path-summary';
import { PropertyResult } from '../entities/property-result';
import { Run } from '../entities/run';
import { Shard } from '../entities/shard';
import type { MailOutbox } from '../mail/mail-outbox';
import { markRegressions } from './mark-regressions';
import { SHARD_LIVENESS } from './shard-liveness';

/** Rows per INSERT when storing failures: 1,000 rows × ~30 columns stays far below PostgreSQL's 65,535 parameters. */
const INSERT_CHUNK = 1000;

export interface ShardExecutorOptions {
  /**
   * Opens a target by name; null when it is not installed here. May resolve first (an admin-added
   * source installed or described on first use: available-target-opener.ts); a rejection becomes
   * the shard's error result.
   */
  openTarget: (name: string) => Target | null | Promise<Target | null>;
  outbox: MailOutbox;
  /** Base of the links in regression mail. */
  appUrl: string;
  /**
   * A folder for reference values, shared by every process on this machine (the server, `npm
   * run worker`, the seed): values are appended per suite key, whole records per write, and a
   * torn last record is ignored (reference-cache.ts). None: kept in memory only.
   */
  referenceCacheDir?: string | null;
  /** A shard that takes longer is stopped and its points become errors (evaluate-pair.ts's DEFAULT_TIME_LIMIT_MS by default). */
  shardTimeoutMs?: number;
}

/**
 * Runs one shard and stores its results. The suite is evaluated in memory first; everything
 * it produced is then written in one transaction that also marks the shard done and advances
 * the run, so a worker that dies mid-shard leaves nothing behind and the queue's retry starts
 * afresh. The shard row is locked and re-checked inside that transaction, so a shard finished
 * by another worker meanwhile is not stored twice. The last shard of a run completes it:
 * regressions are marked and their mail is queued in the same transaction.
 */
export class ShardExecutor {
  private readonly cache: ReferenceCache;

  constructor(
    private readonly dataSource: DataSource,
    private readonly options: ShardExecutorOptions,
  ) {
    this.cache = new ReferenceCache(options.referenceCacheDir ?? null);
  }

  async execute(shardId: string): Promise<void> {
    const shard = await this.dataSource
      .getRepository(Shard)
      .findOne({ where: { id: shardId }, relations: { run: true, suiteVersion: true } });
    if (!shard || shard.status === 'done' || shard.status === 'cancelled' || shard.run.status === 'cancelled') return;
    // The advisory lock, on a connection of its own, says this worker is alive for as long as it
    // holds it (shard-liveness.ts); a worker that cannot take it leaves the shard to the one that has it.
    const liveness = this.dataSource.createQueryRunner();
    await liveness.connect();
    try {
      const [{ locked }] = await liveness.query(`SELECT pg_try_advisory_lock($1, hashtext($2)) AS locked`, [
        SHARD_LIVENESS.lockClass,
        shardId,
      ]);
      if (!locked) return;
      try {
        await this.claimAndRun(shard);
      } finally {
        await liveness.query(`SELECT pg_advisory_unlock($1, hashtext($2))`, [SHARD_LIVENESS.lockClass, shardId]);
      }
    } finally {
      await liveness.release();
    }
  }

  private async claimAndRun(shard: Shard): Promise<void> {
    const shardId = shard.id;
    // Conditional: a shard finished by another worker since it was read must not turn running again.
    // A shard the queue claimed for this worker is running already and counted as an attempt there.
    const [claimed] = await this.dataSource.query(
      `UPDATE shards SET status = 'running', attempts = attempts + (status = 'queued')::int, claimed_at = clock_timestamp()
        WHERE id = $1 AND status IN ('queued', 'running') RETURNING id`,
      [shardId],
    );
    if (!claimed || claimed.length === 0) return;
    await this.dataSource.query(
      `UPDATE runs SET status = 'running', started_at = coalesce(started_at, now()) WHERE id = $1 AND status = 'queued'`,
      [shard.run.id],
    );

    const result = await this.evaluate(shard);
    await this.dataSource.transaction(async (tx) => {
      // Run first, then shard, the order cancel uses too. FOR NO KEY UPDATE, because the failure
      // rows inserted below take KEY SHARE locks on the run: with FOR UPDATE two shards finishing
      // at once deadlocked (seen in bench:server with two workers).
      await tx.query(`SELECT id FROM runs WHERE id = $1 FOR NO KEY UPDATE`, [shard.run.id]);
      const locked = await tx
        .getRepository(Shard)
        .findOne({ where: { id: shardId }, lock: { mode: 'pessimistic_write' } });
      if (!locked || locked.status === 'done' || locked.status === 'cancelled') return;
      const outcome = await storeResult(tx, shard, result);
      const run = await tx.getRepository(Run).findOneOrFail({ where: { id: shard.run.id } });
      const counts = { ...run.counts };
      for (const k of Object.keys(result.counts) as (keyof OutcomeCounts)[])
        counts[k] = (counts[k] ?? 0) + result.counts[k];
      const byClass = { ...run.byClass };
      for (const k of Object.keys(result.byClass) as DiagnosisClass[])
        byClass[k] = (byClass[k] ?? 0) + result.byClass[k];
      const shardsDone = run.shardsDone + 1;
      // Counted by the matrix's own rule, so every list judges the run as its page does.
      const checksStopped =
        run.checksStopped + (checkStoppedByError({ status: 'done', outcome, counts: result.counts }) ? 1 : 0);
      const checksFailed = run.checksFailed + (outcome === 'fail' ? 1 : 0);
      await tx.getRepository(Run).update(run.id, { counts, byClass, shardsDone, checksStopped, checksFailed });
      if (shardsDone === run.shardsTotal && run.status !== 'cancelled') {
        await markRegressions(tx, run.id, { outbox: this.options.outbox, appUrl: this.options.appUrl });
      }
    });
  }

  private async evaluate(shard: Shard): Promise<SuiteTargetResult> {
    const name = shard.targetName;
    let opened: Target | null = null;
    let openFailure: unknown = null;
    try {
      opened = await this.options.openTarget(name);
    } catch (err) {
      openFailure = err;
    }
    const { result, target } = await evaluatePair(
      shard.suiteVersion.body,
      {
        name,
        library: shard.targetLibrary,
        version: shard.targetVersion,
        settings: {},
        open: () => {
          if (openFailure) throw openFailure;
          if (!opened) throw new Error(`target ${name} is not installed on this worker`);
          return opened;
        },
      },
      {
        cache: this.cache,
        maxFindings: Number.MAX_SAFE_INTEGER,
        properties: { seed: null },
        timeLimitMs: this.options.shardTimeoutMs,
      },
    );
    await target?.close().catch(() => undefined);
    try {
      this.cache.flush();
    } catch (err) {
      // A cache that cannot be written costs time later, never a result.
      console.error('[sheetkeeper] reference cache not written:', err instanceof Error ? err.message : err);
    }
    return result;
  }
}

type FindingField = Extract<(typeof FAILURE_ROW_FIELDS)[number], { fromFinding: unknown }>;

/** The columns a finding fills by itself, as the one list of the failure row's fields reads them. */
const columnsOfFinding = (f: PointFinding) =>
  Object.fromEntries(FAILURE_ROW_FIELDS.flatMap((d) => ('fromFinding' in d ? [[d.key, d.fromFinding(f)]] : []))) as {
    [D in FindingField as D['key']]: ReturnType<D['fromFinding']>;
  };

/** Stores the shard's rows and marks it done; returns the outcome it was stored with. */
async function storeResult(
  tx: EntityManager,
  shard: Shard,
  result: SuiteTargetResult,
): Promise<NonNullable<Shard['outcome']>> {
  const body = shard.suiteVersion.body;
  // A point the target's entry cannot express is counted (counts.notApplicable), never stored as a failure.
  const rows = result.paths.flatMap((path) =>
    path.findings
      .filter((f) => f.outcome.kind !== 'not-applicable')
      .map((f) =>
        tx.getRepository(Failure).create({
          run: { id: shard.run.id },
          shard: { id: shard.id },
          suiteSlug: shard.suiteSlug,
          suiteVersion: body.version,
          targetName: shard.targetName,
          targetLibrary: shard.targetLibrary,
          targetVersion: shard.targetVersion,
          convention: body.convention,
          pathName: path.name,
          ...columnsOfFinding(f),
          pointKey: `${shard.suiteSlug}|${path.name}|${f.zHex.re}|${f.zHex.im}`,
        }),
      ),
  );
  for (let i = 0; i < rows.length; i += INSERT_CHUNK)
    await tx.getRepository(Failure).insert(rows.slice(i, i + INSERT_CHUNK));
  if (result.paths.length > 0) {
    await tx.getRepository(PathSummary).insert(
      result.paths.map((p) => ({
        run: { id: shard.run.id },
        shard: { id: shard.id },
        pathName: p.name,
        kind: p.kind,
        points: p.points,
        counts: p.counts,
        byDiagnosis: p.byDiagnosis,
        jumps: p.jumps,
        monodromy: p.monodromy,
        skipped: p.skipped,
        error: p.error ?? null,
      })),
    );
  }
  if (result.properties && result.properties.length > 0) {
    await tx.getRepository(PropertyResult).insert(
      result.properties.map((o) => ({
        run: { id: shard.run.id },
        shard: { id: shard.id },
        law: o.law,
        kind: o.kind,
        seed: String(o.seed),
        outcome: o,
      })),
    );
  }
  const outcome = result.status === 'cancelled' ? 'error' : result.status;
  await tx.getRepository(Shard).update(shard.id, {
    status: 'done',
    outcome,
    counts: result.counts,
    byClass: result.byClass,
    byDiagnosis: result.byDiagnosis,
    checked: result.checked,
    errors: result.errors,
    durationMs: result.durationMs,
    finishedAt: new Date(),
  });
  return outcome;
}
