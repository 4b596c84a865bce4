import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { ROLES } from '../../shared/roles';
import { idParams } from '../../shared/schemas/id-params';
import { Deviation } from '../entities/deviation';
import { HttpError } from '../http/http-error';
import { declareRoute } from '../http/declare-route';

const view = (d: Deviation) => ({
  id: d.id,
  classification: d.classification,
  scope: d.scope,
  targetKey: d.targetKey,
  suiteSlug: d.suiteSlug,
  pathName: d.pathName,
  pointKey: d.pointKey,
  diagnosisKind: d.diagnosisKind,
  reason: d.reason,
  expiresAt: d.expiresAt?.toISOString() ?? null,
  failureId: d.failureId,
  createdBy: d.createdBy.displayName,
  createdAt: d.createdAt.toISOString(),
  revokedAt: d.revokedAt?.toISOString() ?? null,
});

/** Reviewers' verdicts: everyone reads them; reviewers (and admins) revoke them. */
export function deviationsRouter(dataSource: DataSource): Router {
  const router = Router();
  const deviations = dataSource.getRepository(Deviation);
  declareRoute(
    router,
    'get',
    '/',
    {
      summary: "Reviewers' verdicts on failures (deviations), newest first, at most 500",
      access: ROLES,
      responses: { 200: 'The verdicts (`deviations`).' },
    },
    async (_req, res) => {
      res.json({
        deviations: (
          await deviations.find({ relations: { createdBy: true }, order: { createdAt: 'DESC' }, take: 500 })
        ).map(view),
      });
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
      res.json({ deviation: view(await deviations.save(found)) });
    },
  );
  return router;
}
