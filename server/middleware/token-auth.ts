import type { NextFunction, Request, Response } from 'express';
import type { DataSource } from 'typeorm';
import type { ApiError } from '../../shared/api-error';
import { ApiToken } from '../entities/api-token';
import { hashToken } from '../auth/hash-token';

/**
 * `Authorization: Bearer skt_…` signs the request in as the token's owner, for this request
 * only (no session, no cookie). A token that is unknown or revoked gets 401 rather than
 * falling back to a cookie, so a CI job with a dead token fails loudly.
 */
export function tokenAuth(dataSource: DataSource) {
  const tokens = dataSource.getRepository(ApiToken);
  return async (req: Request, res: Response, next: NextFunction): Promise<void> => {
    const header = req.get('authorization');
    if (!header) return next();
    const match = /^Bearer (skt_[A-Za-z0-9_-]{20,100})$/.exec(header);
    const found = match
      ? await tokens.findOne({ where: { tokenHash: hashToken(match[1]!) }, relations: { user: true } })
      : null;
    if (!found || found.revokedAt) {
      res.status(401).json({ kind: 'signed-out', message: 'That API token is not valid.' } satisfies ApiError);
      return;
    }
    // Read with the token on every request (no cache), so a deactivation refuses it at once.
    if (found.user.deactivatedAt) {
      res.status(401).json({
        kind: 'signed-out',
        message: "That API token's account is deactivated; ask an admin to reactivate it.",
      } satisfies ApiError);
      return;
    }
    await tokens.update(found.id, { lastUsedAt: new Date() });
    req.user = found.user;
    res.locals.viaToken = true;
    next();
  };
}
