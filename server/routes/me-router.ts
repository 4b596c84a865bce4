import { Router } from 'express';
import { ROLES } from '../../shared/roles';
import { requireRole } from '../middleware/require-role';
import { toPublicUser } from '../views/to-public-user';

export function meRouter(): Router {
  const router = Router();
  router.get('/', requireRole(...ROLES), (req, res) => {
    res.json({ user: toPublicUser(req.user!) });
  });
  return router;
}
