import type { NextFunction, Request, Response } from 'express';
import { HttpError } from '../http/http-error';

/** After `requireRole`: a request signed in with an API token (not the session cookie) gets 403. */
export function requireSession(_req: Request, res: Response, next: NextFunction): void {
  if (res.locals.viaToken)
    throw new HttpError(403, {
      kind: 'forbidden',
      message: 'Tokens are managed from a signed-in session, not with a token.',
    });
  next();
}
