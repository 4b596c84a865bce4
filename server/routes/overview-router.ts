import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { ROLES } from '../../shared/roles';
import { declareRoute } from '../http/declare-route';
import { loadOverview } from '../views/load-overview';
import type { OverviewMemo } from '../views/overview-memo';

/** The Overview: everyone reads it; what "needs me" depends on who asks. */
export function overviewRouter(dataSource: DataSource, memo: OverviewMemo): Router {
  const router = Router();
  declareRoute(
    router,
    'get',
    '/',
    {
      summary:
        'The Overview: plans and runs, the review queue, and regressions in the plans that mail me and on my subscriptions',
      access: ROLES,
      responses: { 200: 'The overview (`overview`), as the caller sees it.' },
    },
    async (req, res) => {
      res.json({ overview: await loadOverview(dataSource, req.user!, memo) });
    },
  );
  return router;
}
