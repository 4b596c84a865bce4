import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { z } from 'zod';
import { ROLES } from '../../shared/roles';
import type { WorkerView } from '../../shared/worker-view';
import { workerViewSchema } from '../../shared/worker-view-schema';
import { declareRoute } from '../http/declare-route';
import { liveWorkerSql } from '../sql/live-worker-sql';

/** The live worker processes and the targets each takes: everyone may read them (the run page says who runs what). */
export function workersRouter(dataSource: DataSource): Router {
  const router = Router();
  declareRoute(
    router,
    'get',
    '/',
    {
      summary: 'The live worker processes and the targets each takes shards for (docs/workers.md)',
      access: ROLES,
      responses: {
        200: {
          description: 'The live workers, oldest first.',
          schema: z.object({ workers: z.array(workerViewSchema) }),
        },
      },
    },
    async (_req, res) => {
      const rows: { id: string; label: string; targets: string[]; startedAt: Date; heartbeatAt: Date }[] =
        await dataSource.query(
          `SELECT w.id::text, w.label, w.targets, w.started_at AS "startedAt", w.heartbeat_at AS "heartbeatAt"
             FROM workers w WHERE ${liveWorkerSql('w')} ORDER BY w.started_at, w.id`,
        );
      const workers: WorkerView[] = rows.map((w) => ({
        ...w,
        startedAt: w.startedAt.toISOString(),
        heartbeatAt: w.heartbeatAt.toISOString(),
      }));
      res.json({ workers });
    },
  );
  return router;
}
