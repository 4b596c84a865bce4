import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { ROLES } from '../../shared/roles';
import { requireRole } from '../middleware/require-role';
import { loadOverview } from '../views/load-overview';
import type { OverviewMemo } from '../views/overview-memo';

/** The Overview: everyone reads it; what "needs me" depends on who asks. */
export function overviewRouter(dataSource: DataSource, memo: OverviewMemo): Router {
  const router = Router();
  router.get('/', requireRole(...ROLES), async (req, res) => {
    res.json({ overview: await loadOverview(dataSource, req.user!, memo) });
  });
  return router;
}
