import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { ROLES } from '../../shared/roles';
import { subscriptionsBody } from '../../shared/schemas/subscriptions-body';
import { Subscription } from '../entities/subscription';
import { requireRole } from '../middleware/require-role';
import { parseInput } from '../http/parse-input';
import { targetKeySql } from '../sql/target-key-sql';

/** My subscriptions, and the libraries one can subscribe to (from the known targets). */
export function subscriptionsRouter(dataSource: DataSource): Router {
  const router = Router();
  const anyone = requireRole(...ROLES);
  const mine = async (userId: string) =>
    (await dataSource.getRepository(Subscription).find({ where: { userId }, order: { targetKey: 'ASC' } })).map(
      (s) => s.targetKey,
    );

  router.get('/', anyone, async (req, res) => {
    const available: { key: string }[] = await dataSource.query(
      `SELECT DISTINCT ${targetKeySql('name')} AS key FROM targets ORDER BY key`,
    );
    res.json({ targetKeys: await mine(req.user!.id), available: available.map((a) => a.key) });
  });
  router.put('/', anyone, async (req, res) => {
    const { targetKeys } = parseInput(subscriptionsBody, req.body, 'body');
    await dataSource.transaction(async (tx) => {
      await tx.getRepository(Subscription).delete({ userId: req.user!.id });
      if (targetKeys.length > 0)
        await tx
          .getRepository(Subscription)
          .insert(targetKeys.map((targetKey) => ({ userId: req.user!.id, targetKey })));
    });
    res.json({ targetKeys: await mine(req.user!.id) });
  });
  return router;
}
