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
    // Six fields: every second, so each advance of the fake clock by a second is one due time.
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
    // Every claim either scheduler makes, so the test can wait for the database work a tick starts.
    const claims = [jest.spyOn(a, 'fire'), jest.spyOn(b, 'fire')];
    const settled = () => Promise.allSettled(claims.flatMap((spy) => spy.mock.results.map((r) => r.value)));
    // node-cron arms setTimeout from new Date(); faking both makes each second a step of the test, not a wait.
    // Promises, process.nextTick and setImmediate stay real so that pg's socket work goes on.
    jest.useFakeTimers({
      now: new Date('2026-12-04T10:00:00.500Z'),
      doNotFake: ['nextTick', 'setImmediate', 'queueMicrotask'],
    });
    try {
      await Promise.all([a.start(), b.start()]);
      for (let second = 0; second < 3; second++) {
        await jest.advanceTimersByTimeAsync(1000);
        await settled();
      }
      // Each scheduler saw each of the three due seconds; each second started one run.
      for (const spy of claims) expect(spy).toHaveBeenCalledTimes(3);
      expect(started).toEqual(['2026-12-04T10:00:01.000Z', '2026-12-04T10:00:02.000Z', '2026-12-04T10:00:03.000Z']);
      const [{ n }] = await db.dataSource.query(`SELECT count(*)::int AS n FROM schedule_firings`);
      expect(n).toBe(3);
      await Promise.all([a.stop(), b.stop()]);
      await jest.advanceTimersByTimeAsync(5000);
      await settled();
      for (const spy of claims) expect(spy).toHaveBeenCalledTimes(3);
      expect(started).toHaveLength(3);
    } finally {
      jest.useRealTimers();
    }
  });

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
