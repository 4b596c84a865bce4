import { Router } from 'express';
import type { DataSource } from 'typeorm';
import type { ApiError } from '../../shared/api-error';
import { z } from 'zod';
import { publicUserSchema } from '../../shared/public-user-schema';
import { idParams } from '../../shared/schemas/id-params';
import { roleChangeBody } from '../../shared/schemas/role-change-body';
import { User } from '../entities/user';
import { declareRoute } from '../http/declare-route';
import type { ShortLivedCache } from '../auth/short-lived-cache';
import { toPublicUser } from '../views/to-public-user';

/** `signedIn` is the app's cache of signed-in users: a role change drops the user's entry so it applies at once. */
export function usersRouter(dataSource: DataSource, signedIn: ShortLivedCache<User>): Router {
  const router = Router();
  const users = dataSource.getRepository(User);

  declareRoute(
    router,
    'get',
    '/',
    {
      summary: 'Every user, oldest first',
      access: ['admin'],
      responses: { 200: { description: 'Every user.', schema: z.object({ users: z.array(publicUserSchema) }) } },
    },
    async (_req, res) => {
      const all = await users.find({ order: { createdAt: 'ASC', email: 'ASC' } });
      res.json({ users: all.map(toPublicUser) });
    },
  );

  declareRoute(
    router,
    'patch',
    '/:id',
    {
      summary: "Change a user's role (applies at once)",
      access: ['admin'],
      params: idParams,
      body: roleChangeBody,
      responses: {
        200: { description: 'The user with the new role.', schema: z.object({ user: publicUserSchema }) },
        404: 'No user with that id.',
        409: 'This is the last admin; make someone else admin first.',
      },
    },
    async (_req, res, { params: { id }, body: { role } }) => {
      // Read, check and write in one transaction that locks the admins, so two admins
      // demoting each other at once cannot leave the team without one.
      const outcome = await dataSource.transaction(async (tx) => {
        const repo = tx.getRepository(User);
        const admins = await repo.find({ where: { role: 'admin' }, lock: { mode: 'pessimistic_write' } });
        const user = await repo.findOneBy({ id });
        if (!user)
          return { status: 404, body: { kind: 'not-found', message: 'No user with that id.' } satisfies ApiError };
        if (user.role === 'admin' && role !== 'admin' && admins.length <= 1) {
          return {
            status: 409,
            body: {
              kind: 'conflict',
              message: 'This is the last admin; make someone else admin first.',
            } satisfies ApiError,
          };
        }
        user.role = role;
        return { status: 200, body: { user: toPublicUser(await repo.save(user)) } };
      });
      // After the commit, so no request can cache the old role again in between.
      if (outcome.status === 200) signedIn.delete(id);
      res.status(outcome.status).json(outcome.body);
    },
  );

  return router;
}
