import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { ROLES } from '../../shared/roles';
import { idParams } from '../../shared/schemas/id-params';
import { cronPreviewBody, scheduleBody, schedulePatchBody } from '../../shared/schemas/schedule-body';
import { declareRoute } from '../http/declare-route';
import { checkScheduleInterval } from '../plans/check-schedule-interval';
import { nextCronRuns } from '../plans/next-cron-runs';
import { ScheduleService } from '../plans/schedule-service';
import { PLAN_ROLES } from '../../shared/plan-roles';

/** Schedules: everyone reads them; maintainers (and admins) edit them. `preview` answers the next three times of an expression. */
export function schedulesRouter(dataSource: DataSource): Router {
  const router = Router();
  const schedules = new ScheduleService(dataSource);

  declareRoute(
    router,
    'get',
    '/',
    { summary: 'Every schedule', access: ROLES, responses: { 200: 'The schedules (`schedules`).' } },
    async (_req, res) => {
      res.json({ schedules: await schedules.list() });
    },
  );
  declareRoute(
    router,
    'post',
    '/preview',
    {
      summary: 'The next three times a cron expression fires, checked against the shortest interval allowed',
      access: ROLES,
      body: cronPreviewBody,
      responses: { 200: 'The next times (`nextRuns`, ISO 8601).' },
    },
    (_req, res, { body: { cron, timeZone } }) => {
      // The form previews as the expression is typed, so the minimum shows before anything is saved.
      const nextRuns = nextCronRuns(cron, timeZone);
      checkScheduleInterval(cron);
      res.json({ nextRuns: nextRuns.map((d) => d.toISOString()) });
    },
  );
  declareRoute(
    router,
    'post',
    '/',
    {
      summary: 'Schedule a plan',
      access: PLAN_ROLES,
      body: scheduleBody,
      responses: { 201: 'The new schedule (`schedule`).' },
    },
    async (req, res, { body }) => {
      res.status(201).json({ schedule: await schedules.create(req.user!, body) });
    },
  );
  declareRoute(
    router,
    'patch',
    '/:id',
    {
      summary: 'Change a schedule (its expression, time zone or whether it is on)',
      access: PLAN_ROLES,
      params: idParams,
      body: schedulePatchBody,
      responses: { 200: 'The schedule (`schedule`).', 404: 'No schedule with that id.' },
    },
    async (_req, res, { params, body }) => {
      res.json({ schedule: await schedules.update(params.id, body) });
    },
  );
  declareRoute(
    router,
    'delete',
    '/:id',
    {
      summary: 'Delete a schedule',
      access: PLAN_ROLES,
      params: idParams,
      responses: { 204: 'Deleted.', 404: 'No schedule with that id.' },
    },
    async (_req, res, { params }) => {
      await schedules.remove(params.id);
      res.status(204).end();
    },
  );
  return router;
}
