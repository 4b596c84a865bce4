import type { DataSource } from 'typeorm';
import type { ScheduleView } from '../../shared/schedule-view';
import { Plan } from '../entities/plan';
import { Schedule } from '../entities/schedule';
import type { User } from '../entities/user';
import { HttpError } from '../http/http-error';
import { InputError } from '../http/input-error';
import { checkScheduleInterval } from './check-schedule-interval';
import { nextCronRuns } from './next-cron-runs';

/** Schedules of plans. Every change bumps `updated_at`, which the scheduler of every server process polls. */
export class ScheduleService {
  constructor(private readonly dataSource: DataSource) {}

  async list(): Promise<ScheduleView[]> {
    const rows = await this.dataSource
      .getRepository(Schedule)
      .find({ relations: { plan: true }, order: { createdAt: 'ASC' } });
    return rows.map(toView);
  }

  async create(
    user: User,
    body: { planId: string; cron: string; timeZone: string; enabled: boolean },
  ): Promise<ScheduleView> {
    nextCronRuns(body.cron, body.timeZone);
    checkScheduleInterval(body.cron);
    const plan = await this.dataSource.getRepository(Plan).findOneBy({ id: body.planId });
    if (!plan) throw new InputError([{ field: 'body.planId', rule: 'names no plan' }]);
    const saved = await this.dataSource
      .getRepository(Schedule)
      .save({ plan, cron: body.cron, timeZone: body.timeZone, enabled: body.enabled, createdBy: user });
    return toView({ ...saved, plan } as Schedule);
  }

  async update(id: string, patch: { cron?: string; timeZone?: string; enabled?: boolean }): Promise<ScheduleView> {
    const schedules = this.dataSource.getRepository(Schedule);
    const schedule = await schedules.findOne({ where: { id }, relations: { plan: true } });
    if (!schedule) throw notFound();
    const next = {
      cron: patch.cron ?? schedule.cron,
      timeZone: patch.timeZone ?? schedule.timeZone,
      enabled: patch.enabled ?? schedule.enabled,
    };
    nextCronRuns(next.cron, next.timeZone);
    // Only a new expression is held to the minimum, so a schedule saved before it can still be paused.
    if (patch.cron !== undefined) checkScheduleInterval(patch.cron);
    await schedules.update(id, next);
    return toView({ ...schedule, ...next } as Schedule);
  }

  async remove(id: string): Promise<void> {
    const result = await this.dataSource.getRepository(Schedule).delete({ id });
    if (!result.affected) throw notFound();
  }
}

function toView(s: Schedule): ScheduleView {
  return {
    id: s.id,
    planId: s.plan.id,
    planName: s.plan.name,
    cron: s.cron,
    timeZone: s.timeZone,
    enabled: s.enabled,
    nextRuns: s.enabled ? nextCronRuns(s.cron, s.timeZone).map((d) => d.toISOString()) : [],
  };
}

function notFound(): HttpError {
  return new HttpError(404, { kind: 'not-found', message: 'No schedule with that id.' });
}
