import type { NextFunction, Request, Response } from 'express';
import type { ApiError } from '../../shared/api-error';
import type { Role } from '../../shared/roles';

/**
 * The one guard for every protected route: 401 when signed out, 403 when the
 * signed-in user's role is not among `roles`.
 */
export function requireRole(...roles: Role[]) {
  return (req: Request, res: Response, next: NextFunction): void => {
    if (!req.user) {
      res.status(401).json({ kind: 'signed-out', message: 'Sign in first.' } satisfies ApiError);
      return;
    }
    if (!roles.includes(req.user.role)) {
      res
        .status(403)
        .json({ kind: 'forbidden', message: `This needs the role ${roles.join(' or ')}.` } satisfies ApiError);
      return;
    }
    next();
  };
}
