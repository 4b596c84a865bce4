import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { ROLES } from '../../shared/roles';
import { idParams } from '../../shared/schemas/id-params';
import { Deviation } from '../entities/deviation';
import { requireRole } from '../middleware/require-role';
import { HttpError } from '../http/http-error';
import { parseInput } from '../http/parse-input';

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
  router.get('/', requireRole(...ROLES), async (_req, res) => {
    res.json({
      deviations: (
        await deviations.find({ relations: { createdBy: true }, order: { createdAt: 'DESC' }, take: 500 })
      ).map(view),
    });
  });
  router.post('/:id/revoke', requireRole('reviewer', 'admin'), async (req, res) => {
    const { id } = parseInput(idParams, req.params, 'params');
    const found = await deviations.findOne({ where: { id }, relations: { createdBy: true } });
    if (!found) throw new HttpError(404, { kind: 'not-found', message: 'No verdict with that id.' });
    if (found.revokedAt) throw new HttpError(409, { kind: 'conflict', message: 'This verdict was revoked already.' });
    found.revokedAt = new Date();
    res.json({ deviation: view(await deviations.save(found)) });
  });
  return router;
}
