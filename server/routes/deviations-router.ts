import { Router } from 'express';
import type { DataSource, FindOptionsWhere } from 'typeorm';
import { ROLES } from '../../shared/roles';
import { decisionListQuery } from '../../shared/schemas/decision-list-query';
import { idParams } from '../../shared/schemas/id-params';
import { Deviation } from '../entities/deviation';
import { HttpError } from '../http/http-error';
import { declareRoute } from '../http/declare-route';
import { toDecisionView } from '../views/to-decision-view';

/** Decisions listed at most; the Decisions screen filters by library and suite past that. */
const LIST_LIMIT = 500;

/** Reviewers' verdicts (decisions): everyone reads them; reviewers (and admins) revoke them. */
export function deviationsRouter(dataSource: DataSource): Router {
  const router = Router();
  const deviations = dataSource.getRepository(Deviation);
  declareRoute(
    router,
    'get',
    '/',
    {
      summary:
        "Reviewers' verdicts on failures (decisions), newest first, at most 500, with each one's scope, versions and state; filtered by library, suite or id",
      access: ROLES,
      query: decisionListQuery,
      responses: { 200: 'The verdicts (`deviations`), expired and revoked ones included with their `state`.' },
    },
    async (_req, res, { query }) => {
      const where: FindOptionsWhere<Deviation> = {};
      if (query.library) where.targetKey = query.library;
      if (query.suite) where.suiteSlug = query.suite;
      if (query.id) where.id = query.id;
      const found = await deviations.find({
        where,
        relations: { createdBy: true },
        order: { createdAt: 'DESC' },
        take: LIST_LIMIT,
      });
      res.json({ deviations: found.map(toDecisionView) });
    },
  );
  declareRoute(
    router,
    'post',
    '/:id/revoke',
    {
      summary: 'Revoke a verdict',
      access: ['reviewer', 'admin'],
      params: idParams,
      responses: {
        200: 'The revoked verdict (`deviation`).',
        404: 'No verdict with that id.',
        409: 'The verdict was revoked already.',
      },
    },
    async (_req, res, { params: { id } }) => {
      const found = await deviations.findOne({ where: { id }, relations: { createdBy: true } });
      if (!found) throw new HttpError(404, { kind: 'not-found', message: 'No verdict with that id.' });
      if (found.revokedAt) throw new HttpError(409, { kind: 'conflict', message: 'This verdict was revoked already.' });
      found.revokedAt = new Date();
      res.json({ deviation: toDecisionView(await deviations.save(found)) });
    },
  );
  return router;
}
