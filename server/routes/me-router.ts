import { Router } from 'express';
import { ROLES } from '../../shared/roles';
import { declareRoute } from '../http/declare-route';
import { toPublicUser } from '../views/to-public-user';

export function meRouter(): Router {
  const router = Router();
  declareRoute(
    router,
    'get',
    '/',
    { summary: 'The signed-in user', access: ROLES, responses: { 200: 'The user (`user`).' } },
    (req, res) => {
      res.json({ user: toPublicUser(req.user!) });
    },
  );
  return router;
}
