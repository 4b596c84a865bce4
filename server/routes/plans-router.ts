import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { ROLES } from '../../shared/roles';
import { idParams } from '../../shared/schemas/id-params';
import { planBody } from '../../shared/schemas/plan-body';
import { requireRole } from '../middleware/require-role';
import { parseInput } from '../http/parse-input';
import { PlanService } from '../plans/plan-service';

/** Plans: everyone reads them; maintainers (and admins) shape them. */
export function plansRouter(dataSource: DataSource): Router {
  const router = Router();
  const plans = new PlanService(dataSource);
  const shapers = requireRole('maintainer', 'admin');

  router.get('/', requireRole(...ROLES), async (_req, res) => {
    res.json({ plans: await plans.list() });
  });
  router.get('/:id', requireRole(...ROLES), async (req, res) => {
    res.json({ plan: await plans.get(parseInput(idParams, req.params, 'params').id) });
  });
  router.post('/', shapers, async (req, res) => {
    res.status(201).json({ plan: await plans.save(req.user!, parseInput(planBody, req.body, 'body'), null) });
  });
  router.put('/:id', shapers, async (req, res) => {
    const { id } = parseInput(idParams, req.params, 'params');
    res.json({ plan: await plans.save(req.user!, parseInput(planBody, req.body, 'body'), id) });
  });
  router.delete('/:id', shapers, async (req, res) => {
    await plans.remove(parseInput(idParams, req.params, 'params').id);
    res.status(204).end();
  });
  return router;
}
