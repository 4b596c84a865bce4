import { Router } from 'express';
import { z } from 'zod';
import { publicUserSchema } from '../../shared/public-user-schema';
import { ROLES } from '../../shared/roles';
import { declareRoute } from '../http/declare-route';
import { toPublicUser } from '../views/to-public-user';

export function meRouter(): Router {
  const router = Router();
  declareRoute(
    router,
    'get',
    '/',
    {
      summary: 'The signed-in user',
      access: ROLES,
      responses: { 200: { description: 'The signed-in user.', schema: z.object({ user: publicUserSchema }) } },
    },
    (req, res) => {
      res.json({ user: toPublicUser(req.user!) });
    },
  );
  return router;
}
