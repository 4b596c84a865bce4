import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { ROLES } from '../../shared/roles';
import { idParams } from '../../shared/schemas/id-params';
import { findingsByKindQuery } from '../../shared/schemas/findings-by-kind-query';
import { planBody } from '../../shared/schemas/plan-body';
import { declareRoute } from '../http/declare-route';
import { loadFindingsByKind } from '../plans/load-findings-by-kind';
import { PlanService } from '../plans/plan-service';
import { PLAN_ROLES } from '../../shared/plan-roles';

/** Plans: everyone reads them; maintainers (and admins) shape them. */
export function plansRouter(dataSource: DataSource): Router {
  const router = Router();
  const plans = new PlanService(dataSource);
  const noPlan = { 404: 'No plan with that id.' };

  declareRoute(
    router,
    'get',
    '/',
    { summary: 'Every plan', access: ROLES, responses: { 200: 'The plans (`plans`).' } },
    async (_req, res) => {
      res.json({ plans: await plans.list() });
    },
  );
  declareRoute(
    router,
    'get',
    '/:id',
    {
      summary: 'One plan',
      access: ROLES,
      params: idParams,
      responses: { 200: 'The plan (`plan`).', ...noPlan },
    },
    async (_req, res, { params }) => {
      res.json({ plan: await plans.get(params.id) });
    },
  );
  declareRoute(
    router,
    'get',
    '/:id/findings-by-kind',
    {
      summary: "A plan's findings by diagnosis kind across its latest completed runs",
      access: ROLES,
      params: idParams,
      query: findingsByKindQuery,
      responses: {
        200: 'The runs oldest first, each with its failing points counted under each of their labels (`runs`, `limit`).',
        400: '`runs` is not a whole number from 1 to 50.',
        ...noPlan,
      },
    },
    async (_req, res, { params, query }) => {
      res.json(await loadFindingsByKind(dataSource, params.id, query.runs));
    },
  );
  declareRoute(
    router,
    'post',
    '/',
    {
      summary: 'Create a plan: suites × targets, and who is mailed about regressions',
      access: PLAN_ROLES,
      body: planBody,
      responses: {
        201: 'The new plan (`plan`); a name taken or an unknown suite or target is a 400 naming the field.',
      },
    },
    async (req, res, { body }) => {
      res.status(201).json({ plan: await plans.save(req.user!, body, null) });
    },
  );
  declareRoute(
    router,
    'put',
    '/:id',
    {
      summary: 'Replace a plan',
      access: PLAN_ROLES,
      params: idParams,
      body: planBody,
      responses: { 200: 'The plan (`plan`).', ...noPlan },
    },
    async (req, res, { params, body }) => {
      res.json({ plan: await plans.save(req.user!, body, params.id) });
    },
  );
  declareRoute(
    router,
    'delete',
    '/:id',
    {
      summary: 'Delete a plan',
      access: PLAN_ROLES,
      params: idParams,
      responses: { 204: 'Deleted.', ...noPlan },
    },
    async (_req, res, { params }) => {
      await plans.remove(params.id);
      res.status(204).end();
    },
  );
  return router;
}
