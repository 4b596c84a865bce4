import type { DataSource } from 'typeorm';
import { installedTargets, resolveTargetSource } from '../../harness';
import type { TargetIdentity } from '../../shared/target-identity';
import { targetIdentityOf } from '../../shared/target-identity-of';
import { describeError } from '../database/describe-error';
import { TargetRow } from '../entities/target-row';
import { TargetSourceRow } from '../entities/target-source-row';
import { installedTargetRows } from './installed-target-rows';
import { readyTargetSources } from './ready-target-sources';
import { storableReason } from './storable-reason';
import { TARGET_NAMES_LOCK_SQL } from './target-names-lock-sql';

type ResolveOptions = Parameters<typeof resolveTargetSource>[1];

/**
 * Resolves admin-added target sources off the request thread (docs/libraries-screen.md): the route
 * stores a row in state `resolving` and calls `later(id)`; the source is then resolved here, one at
 * a time in this process (an npm install takes seconds and two at once would only compete for the
 * two cores; describing Python's cmath adapter took 60–190 ms in the route test), and the row becomes
 * `ready` with its targets recorded in `targets`, or `failed` with the reason. A program that never
 * answers `describe` holds the queue for its time limit plus the stdio target's 10 s start-up
 * allowance, then fails. A row removed meanwhile is left alone.
 */
export class TargetSourceResolver {
  private chain: Promise<void> = Promise.resolve();

  constructor(
    private readonly dataSource: DataSource,
    private readonly options: ResolveOptions,
    private readonly resolve: typeof resolveTargetSource = resolveTargetSource,
  ) {}

  /** Queues the row's resolution behind those already waiting; never rejects. */
  later(id: string): void {
    this.chain = this.chain.then(() =>
      this.resolveNow(id).catch((err: unknown) =>
        console.error('[sheetkeeper] target source not resolved:', describeError(err)),
      ),
    );
  }

  /** Queues every row still `resolving` (a process that stopped mid-way leaves them so); returns how many. */
  async resumePending(): Promise<number> {
    const rows: { id: string }[] = await this.dataSource.query(
      `SELECT id FROM target_sources WHERE state = 'resolving' ORDER BY added_at, id`,
    );
    for (const { id } of rows) this.later(id);
    return rows.length;
  }

  /** Settles once everything queued so far is resolved (for shutdown and tests). */
  idle(): Promise<void> {
    return this.chain;
  }

  private async resolveNow(id: string): Promise<void> {
    const row = await this.dataSource.getRepository(TargetSourceRow).findOneBy({ id });
    if (!row || row.state !== 'resolving') return;
    let identities: TargetIdentity[];
    try {
      identities = (await this.resolve(row.source, this.options)).map(targetIdentityOf);
      if (identities.length === 0) throw new Error('it names no target');
    } catch (err) {
      await this.fail(id, err instanceof Error ? err.message : String(err));
      return;
    }
    try {
      await this.record(id, identities);
    } catch (err) {
      // A description PostgreSQL refuses (a NUL in an entry's name) must not leave the row resolving for ever.
      console.error('[sheetkeeper] target source not recorded:', describeError(err));
      await this.fail(id, 'Its description could not be stored: it holds text the database refuses.');
    }
  }

  /** Conditional: a row removed (or finished by another process) meanwhile is not written again. */
  private async fail(id: string, reason: string): Promise<void> {
    await this.dataSource
      .getRepository(TargetSourceRow)
      .update({ id, state: 'resolving' }, { state: 'failed', error: storableReason(reason), resolvedAt: new Date() });
  }

  private async record(id: string, identities: TargetIdentity[]): Promise<void> {
    // installedTargets() is discovered once per process; the set is cheap to build per source.
    const builtIn = new Set(installedTargets().map((d) => d.name));
    await this.dataSource.transaction(async (tx) => {
      await tx.query(TARGET_NAMES_LOCK_SQL);
      const current = await tx
        .getRepository(TargetSourceRow)
        .findOne({ where: { id }, lock: { mode: 'pessimistic_write' } });
      if (!current || current.state !== 'resolving') return;
      const taken = new Set(builtIn);
      for (const other of await readyTargetSources(tx)) for (const t of other.targets) taken.add(t.name);
      const clash = identities.find(
        (t, i) => taken.has(t.name) || identities.findIndex((u) => u.name === t.name) !== i,
      );
      if (clash) {
        await tx.getRepository(TargetSourceRow).update(id, {
          state: 'failed',
          error: `A target named ${clash.name} exists already: give this source a name of its own.`,
          resolvedAt: new Date(),
        });
        return;
      }
      await tx
        .getRepository(TargetSourceRow)
        .update(id, { state: 'ready', targets: identities, error: null, resolvedAt: new Date() });
      await tx.getRepository(TargetRow).upsert(installedTargetRows(identities, new Date()), ['name']);
    });
  }
}

/** What is stored of a descriptor: its identity, never its opener. */
