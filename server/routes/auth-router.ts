import { Router } from 'express';
import type { configurePassport } from '../auth/configure-passport';
import type { ApiError } from '../../shared/api-error';
import { z } from 'zod';
import { publicUserSchema } from '../../shared/public-user-schema';
import { signInBody } from '../../shared/schemas/sign-in-body';
import type { User } from '../entities/user';
import { declareRoute } from '../http/declare-route';
import type { SignInLimiter } from '../auth/sign-in-limiter';
import { toPublicUser } from '../views/to-public-user';

const WRONG: ApiError = { kind: 'wrong-credentials', message: 'That e-mail and password do not match an account.' };

export function authRouter(passport: ReturnType<typeof configurePassport>, limiter: SignInLimiter): Router {
  const router = Router();

  declareRoute(
    router,
    'post',
    '/sign-in',
    {
      summary: 'Sign in with e-mail and password; the answer sets the session cookie',
      access: 'public',
      body: signInBody,
      responses: {
        200: {
          description: 'Signed in; the session cookie is set with a new session id.',
          schema: z.object({ user: publicUserSchema }),
        },
        401: 'The e-mail and password do not match an account (`wrong-credentials`).',
        429: 'Too many failed attempts from this client or on this account (`too-many-attempts`, with `Retry-After`).',
      },
    },
    async (req, res, { body }, next) => {
      req.body = body;
      // The client as the listener sees it, or as a trusted proxy names it (`trust proxy`, off by default).
      const client = req.ip ?? req.socket.remoteAddress ?? 'unknown';
      const wait = await limiter.admit(body.email, client);
      if (wait > 0) {
        res.set('Retry-After', String(wait));
        res.status(429).json({
          kind: 'too-many-attempts',
          message: `Too many failed attempts. Try again in ${wait < 60 ? `${wait} s` : `${Math.ceil(wait / 60)} min`}.`,
          retryAfterSeconds: wait,
        } satisfies ApiError);
        return;
      }
      passport.authenticate('local', { session: false }, (err: unknown, user: User | false) => {
        if (err) return next(err);
        if (!user) {
          limiter.recordFailure(body.email, client).then(() => res.status(401).json(WRONG), next);
          return;
        }
        // req.logIn regenerates the session id (passport ≥ 0.6) before storing the user.
        req.logIn(user, (loginErr) => {
          if (loginErr) return next(loginErr);
          limiter.recordSuccess(body.email, client).then(() => res.json({ user: toPublicUser(user) }), next);
        });
      })(req, res, next);
    },
  );

  declareRoute(
    router,
    'post',
    '/sign-out',
    {
      summary: 'Sign out: the session ends and its cookie is cleared',
      access: 'public',
      responses: { 204: 'Signed out (or was not signed in).' },
    },
    (req, res, _input, next) => {
      req.logout((logoutErr) => {
        if (logoutErr) return next(logoutErr);
        req.session.destroy((destroyErr) => {
          if (destroyErr) return next(destroyErr);
          res.clearCookie('sheetkeeper.sid', { path: '/' });
          res.status(204).end();
        });
      });
    },
  );

  return router;
}
