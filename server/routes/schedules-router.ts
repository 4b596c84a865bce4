import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { ROLES } from '../../shared/roles';
import { idParams } from '../../shared/schemas/id-params';
import { cronPreviewBody, scheduleBody, schedulePatchBody } from '../../shared/schemas/schedule-body';
import { requireRole } from '../middleware/require-role';
import { checkScheduleInterval } from '../plans/check-schedule-interval';
import { nextCronRuns } from '../plans/next-cron-runs';
import { parseInput } from '../http/parse-input';
import { ScheduleService } from '../plans/schedule-service';

/** Schedules: everyone reads them; maintainers (and admins) edit them. `preview` answers the next three times of an expression. */
export function schedulesRouter(dataSource: DataSource): Router {
  const router = Router();
  const schedules = new ScheduleService(dataSource);
  const editors = requireRole('maintainer', 'admin');

  router.get('/', requireRole(...ROLES), async (_req, res) => {
    res.json({ schedules: await schedules.list() });
  });
  router.post('/preview', requireRole(...ROLES), (req, res) => {
    const { cron, timeZone } = parseInput(cronPreviewBody, req.body, 'body');
    // The form previews as the expression is typed, so the minimum shows before anything is saved.
    const nextRuns = nextCronRuns(cron, timeZone);
    checkScheduleInterval(cron);
    res.json({ nextRuns: nextRuns.map((d) => d.toISOString()) });
  });
  router.post('/', editors, async (req, res) => {
    res.status(201).json({ schedule: await schedules.create(req.user!, parseInput(scheduleBody, req.body, 'body')) });
  });
  router.patch('/:id', editors, async (req, res) => {
    const { id } = parseInput(idParams, req.params, 'params');
    res.json({ schedule: await schedules.update(id, parseInput(schedulePatchBody, req.body, 'body')) });
  });
  router.delete('/:id', editors, async (req, res) => {
    await schedules.remove(parseInput(idParams, req.params, 'params').id);
    res.status(204).end();
  });
  return router;
}
