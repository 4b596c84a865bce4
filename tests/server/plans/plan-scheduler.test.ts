import { Plan } from '../../../server/entities/plan';
import { Schedule } from '../../../server/entities/schedule';
import { User } from '../../../server/entities/user';
import { PlanScheduler } from '../../../server/plans/plan-scheduler';
import { createTestDatabase, type TestDatabase } from '../../setup/test-database';

describe('PlanScheduler', () => {
  let db: TestDatabase;
  let scheduleId: string;
  let planId: string;

  beforeAll(async () => {
    db = await createTestDatabase();
    const kwame = await db.dataSource.getRepository(User).findOneByOrFail({ email: 'kwame@sheetkeeper.test' });
    const plan = await db.dataSource
      .getRepository(Plan)
      .save({ name: 'scheduler test', description: '', recipients: [], suites: [], targets: [], createdBy: kwame });
    planId = plan.id;
    // Six fields: every second, so the test sees firings within a few seconds.
    const schedule = await db.dataSource
      .getRepository(Schedule)
      .save({ plan, cron: '* * * * * *', timeZone: 'UTC', enabled: true, createdBy: kwame });
    scheduleId = schedule.id;
  });
  afterAll(() => db.drop());

  it('starts one run for a due time claimed by two processes at once', async () => {
    const started: string[] = [];
    const startRun = async (_plan: string, _schedule: string, due: Date) => {
      started.push(due.toISOString());
      return `run-${started.length}`;
    };
    const a = new PlanScheduler(db.dataSource, startRun);
    const b = new PlanScheduler(db.dataSource, startRun);
    const due = new Date('2026-12-02T01:30:00.250Z');
    const results = await Promise.all([a.fire(scheduleId, planId, due), b.fire(scheduleId, planId, due)]);
    expect(results.filter((r) => r !== null)).toHaveLength(1);
    expect(started).toEqual(['2026-12-02T01:30:00.000Z']);
    const [row] = await db.dataSource.query(
      `SELECT outcome FROM schedule_firings WHERE schedule_id = $1 AND due_at = $2`,
      [scheduleId, new Date('2026-12-02T01:30:00Z')],
    );
    expect(row.outcome).toBe('run run-1');
  });

  it('fires each due second once across two running schedulers, and stops when told', async () => {
    await db.dataSource.query('DELETE FROM schedule_firings');
    const started: string[] = [];
    const startRun = async (_plan: string, _schedule: string, due: Date) => {
      started.push(due.toISOString());
      return 'run';
    };
    const a = new PlanScheduler(db.dataSource, startRun);
    const b = new PlanScheduler(db.dataSource, startRun);
    await Promise.all([a.start(), b.start()]);
    await new Promise((resolve) => setTimeout(resolve, 3200));
    await Promise.all([a.stop(), b.stop()]);
    await new Promise((resolve) => setTimeout(resolve, 300));
    const seen = started.length;
    expect(seen).toBeGreaterThanOrEqual(2);
    expect(new Set(started).size).toBe(seen);
    const [{ n }] = await db.dataSource.query(`SELECT count(*)::int AS n FROM schedule_firings`);
    expect(n).toBe(seen);
    await new Promise((resolve) => setTimeout(resolve, 1200));
    expect(started).toHaveLength(seen);
  }, 15_000);

  it('records why no run started when starting fails', async () => {
    const s = new PlanScheduler(db.dataSource, async () => {
      throw new Error('the plan has no approved suite');
    });
    await expect(s.fire(scheduleId, planId, new Date('2026-12-03T00:00:00Z'))).rejects.toThrow('no approved suite');
    const [row] = await db.dataSource.query(`SELECT outcome FROM schedule_firings WHERE due_at = $1`, [
      new Date('2026-12-03T00:00:00Z'),
    ]);
    expect(row.outcome).toBe('no run: the plan has no approved suite');
  });
});
