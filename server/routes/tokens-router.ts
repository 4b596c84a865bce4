import { randomBytes } from 'node:crypto';
import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { ROLES } from '../../shared/roles';
import { idParams } from '../../shared/schemas/id-params';
import { tokenBody } from '../../shared/schemas/token-body';
import type { TokenView } from '../../shared/token-view';
import { ApiToken } from '../entities/api-token';
import { requireRole } from '../middleware/require-role';
import { hashToken } from '../auth/hash-token';
import { HttpError } from '../http/http-error';
import { parseInput } from '../http/parse-input';

const view = (t: ApiToken): TokenView => ({
  id: t.id,
  name: t.name,
  prefix: t.prefix,
  createdAt: t.createdAt.toISOString(),
  lastUsedAt: t.lastUsedAt?.toISOString() ?? null,
  revokedAt: t.revokedAt?.toISOString() ?? null,
});

/** My API tokens: list, create (the secret is shown once) and revoke. Tokens cannot make tokens. */
export function tokensRouter(dataSource: DataSource): Router {
  const router = Router();
  const tokens = dataSource.getRepository(ApiToken);
  const signedInBySession = [
    requireRole(...ROLES),
    (_req: unknown, res: { locals: Record<string, unknown> }, next: () => void) => {
      if (res.locals.viaToken)
        throw new HttpError(403, {
          kind: 'forbidden',
          message: 'Tokens are managed from a signed-in session, not with a token.',
        });
      next();
    },
  ];

  router.get('/', ...signedInBySession, async (req, res) => {
    res.json({
      tokens: (await tokens.find({ where: { user: { id: req.user!.id } }, order: { createdAt: 'DESC' } })).map(view),
    });
  });
  router.post('/', ...signedInBySession, async (req, res) => {
    const { name } = parseInput(tokenBody, req.body, 'body');
    const secret = `skt_${randomBytes(32).toString('base64url')}`;
    const saved = await tokens.save({
      user: req.user!,
      name,
      tokenHash: hashToken(secret),
      prefix: secret.slice(0, 10),
      lastUsedAt: null,
      revokedAt: null,
    });
    res.status(201).json({ token: view(saved), secret });
  });
  router.post('/:id/revoke', ...signedInBySession, async (req, res) => {
    const { id } = parseInput(idParams, req.params, 'params');
    const token = await tokens.findOne({ where: { id }, relations: { user: true } });
    if (!token || (token.user.id !== req.user!.id && req.user!.role !== 'admin'))
      throw new HttpError(404, { kind: 'not-found', message: 'No token of yours with that id.' });
    token.revokedAt ??= new Date();
    res.json({ token: view(await tokens.save(token)) });
  });
  return router;
}
