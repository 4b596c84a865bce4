import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { ROLES } from '../../shared/roles';
import { TargetRow } from '../entities/target-row';
import { requireRole } from '../middleware/require-role';

/** The targets this server has seen, installed ones first. */
export function targetsRouter(dataSource: DataSource): Router {
  const router = Router();
  router.get('/', requireRole(...ROLES), async (_req, res) => {
    const targets = await dataSource
      .getRepository(TargetRow)
      .find({ order: { installed: 'DESC', library: 'ASC', name: 'ASC' } });
    res.json({
      targets: targets.map(({ name, library, version, settings, installed }) => ({
        name,
        library,
        version,
        settings,
        installed,
      })),
    });
  });
  return router;
}
