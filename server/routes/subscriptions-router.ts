import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { ROLES } from '../../shared/roles';
import { subscriptionsBody } from '../../shared/schemas/subscriptions-body';
import { Subscription } from '../entities/subscription';
import { declareRoute } from '../http/declare-route';
import { targetKeySql } from '../sql/target-key-sql';

/** My subscriptions, and the libraries one can subscribe to (from the known targets). */
export function subscriptionsRouter(dataSource: DataSource): Router {
  const router = Router();
  const mine = async (userId: string) =>
    (await dataSource.getRepository(Subscription).find({ where: { userId }, order: { targetKey: 'ASC' } })).map(
      (s) => s.targetKey,
    );

  declareRoute(
    router,
    'get',
    '/',
    {
      summary: 'My subscriptions, and the libraries one can subscribe to',
      access: ROLES,
      responses: { 200: 'My library keys (`targetKeys`) and every known one (`available`).' },
    },
    async (req, res) => {
      const available: { key: string }[] = await dataSource.query(
        `SELECT DISTINCT ${targetKeySql('name')} AS key FROM targets ORDER BY key`,
      );
      res.json({ targetKeys: await mine(req.user!.id), available: available.map((a) => a.key) });
    },
  );
  declareRoute(
    router,
    'put',
    '/',
    {
      summary: 'Replace my subscriptions',
      access: ROLES,
      body: subscriptionsBody,
      responses: { 200: 'My library keys now (`targetKeys`).' },
    },
    async (req, res, { body: { targetKeys } }) => {
      await dataSource.transaction(async (tx) => {
        await tx.getRepository(Subscription).delete({ userId: req.user!.id });
        if (targetKeys.length > 0)
          await tx
            .getRepository(Subscription)
            .insert(targetKeys.map((targetKey) => ({ userId: req.user!.id, targetKey })));
      });
      res.json({ targetKeys: await mine(req.user!.id) });
    },
  );
  return router;
}
