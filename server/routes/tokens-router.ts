import { randomBytes } from 'node:crypto';
import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { ROLES } from '../../shared/roles';
import { idParams } from '../../shared/schemas/id-params';
import { tokenBody } from '../../shared/schemas/token-body';
import type { TokenView } from '../../shared/token-view';
import { z } from 'zod';
import { tokenViewSchema } from '../../shared/token-view-schema';
import { ApiToken } from '../entities/api-token';
import { hashToken } from '../auth/hash-token';
import { HttpError } from '../http/http-error';
import { declareRoute } from '../http/declare-route';

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
  declareRoute(
    router,
    'get',
    '/',
    {
      summary: 'My API tokens, newest first (never their secrets)',
      access: ROLES,
      sessionOnly: true,
      responses: { 200: { description: 'My tokens.', schema: z.object({ tokens: z.array(tokenViewSchema) }) } },
    },
    async (req, res) => {
      res.json({
        tokens: (await tokens.find({ where: { user: { id: req.user!.id } }, order: { createdAt: 'DESC' } })).map(view),
      });
    },
  );
  declareRoute(
    router,
    'post',
    '/',
    {
      summary: 'Create an API token; its secret is in this answer only',
      access: ROLES,
      sessionOnly: true,
      body: tokenBody,
      responses: {
        201: {
          description: 'The token and its secret, shown this once.',
          schema: z.object({ token: tokenViewSchema, secret: z.string() }),
        },
      },
    },
    async (req, res, { body: { name } }) => {
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
    },
  );
  declareRoute(
    router,
    'post',
    '/:id/revoke',
    {
      summary: "Revoke one of my API tokens (an admin may revoke anyone's)",
      access: ROLES,
      sessionOnly: true,
      params: idParams,
      responses: {
        200: {
          description: 'The revoked token; revoking twice keeps the first time.',
          schema: z.object({ token: tokenViewSchema }),
        },
        404: 'No token of yours with that id.',
      },
    },
    async (req, res, { params: { id } }) => {
      const token = await tokens.findOne({ where: { id }, relations: { user: true } });
      if (!token || (token.user.id !== req.user!.id && req.user!.role !== 'admin'))
        throw new HttpError(404, { kind: 'not-found', message: 'No token of yours with that id.' });
      token.revokedAt ??= new Date();
      res.json({ token: view(await tokens.save(token)) });
    },
  );
  return router;
}
