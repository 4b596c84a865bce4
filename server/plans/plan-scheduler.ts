import { createTask, type ScheduledTask } from 'node-cron';
import type { DataSource } from 'typeorm';
import { Schedule } from '../entities/schedule';
import { describeError } from '../database/describe-error';

/** Starts a run of a plan for a schedule's firing and answers the run's id. */
export type StartScheduledRun = (planId: string, scheduleId: string, dueAt: Date) => Promise<string>;

/** How often each process looks for schedules added, changed or removed elsewhere. */
const RELOAD_MS = 30_000;

/**
 * Fires plan schedules with node-cron inside the server process. Several server processes
 * may run this at once: each due time is claimed by inserting (schedule, due time) into
 * schedule_firings, and only the process whose insert succeeds starts the run.
 */
export class PlanScheduler {
  private tasks = new Map<string, { task: ScheduledTask; signature: string }>();
  private reloadTimer: ReturnType<typeof setInterval> | null = null;

  constructor(
    private readonly dataSource: DataSource,
    private readonly startRun: StartScheduledRun,
    private readonly onError: (err: unknown) => void = (err) =>
      console.error('[sheetkeeper] schedule failed', describeError(err)),
  ) {}

  async start(): Promise<void> {
    await this.reload();
    this.reloadTimer = setInterval(() => void this.reload().catch(this.onError), RELOAD_MS);
  }

  async stop(): Promise<void> {
    if (this.reloadTimer) clearInterval(this.reloadTimer);
    this.reloadTimer = null;
    await Promise.all([...this.tasks.values()].map(({ task }) => task.destroy()));
    this.tasks.clear();
  }

  /** Brings the node-cron tasks in line with the enabled schedules in the database. */
  async reload(): Promise<void> {
    const schedules = await this.dataSource
      .getRepository(Schedule)
      .find({ where: { enabled: true }, relations: { plan: true } });
    const wanted = new Map(schedules.map((s) => [s.id, s]));
    for (const [id, entry] of this.tasks) {
      const s = wanted.get(id);
      if (!s || signatureOf(s) !== entry.signature) {
        await entry.task.destroy();
        this.tasks.delete(id);
      }
    }
    for (const s of schedules) {
      if (this.tasks.has(s.id)) continue;
      const task = createTask(
        s.cron,
        (ctx) => this.fire(s.id, s.plan.id, ctx.date).then(() => undefined, this.onError),
        { timezone: s.timeZone, name: `schedule ${s.id}`, noOverlap: true },
      );
      await task.start();
      this.tasks.set(s.id, { task, signature: signatureOf(s) });
    }
  }

  /**
   * Claims one due time of a schedule and, if this process won the claim, starts the run.
   * Returns the run id, or null when another process had already claimed it.
   */
  async fire(scheduleId: string, planId: string, dueAt: Date): Promise<string | null> {
    const due = new Date(Math.floor(dueAt.getTime() / 1000) * 1000);
    const claimed: unknown[] = await this.dataSource.query(
      `INSERT INTO schedule_firings (schedule_id, due_at) VALUES ($1, $2) ON CONFLICT DO NOTHING RETURNING schedule_id`,
      [scheduleId, due],
    );
    if (claimed.length === 0) return null;
    try {
      const runId = await this.startRun(planId, scheduleId, due);
      await this.dataSource.query(`UPDATE schedule_firings SET outcome = $3 WHERE schedule_id = $1 AND due_at = $2`, [
        scheduleId,
        due,
        `run ${runId}`,
      ]);
      return runId;
    } catch (err) {
      await this.dataSource.query(`UPDATE schedule_firings SET outcome = $3 WHERE schedule_id = $1 AND due_at = $2`, [
        scheduleId,
        due,
        `no run: ${err instanceof Error ? err.message : String(err)}`,
      ]);
      throw err;
    }
  }
}

function signatureOf(s: Schedule): string {
  return `${s.cron}|${s.timeZone}|${s.plan.id}`;
}
