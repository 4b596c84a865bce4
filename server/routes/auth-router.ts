import { Router } from 'express';
import { DEACTIVATED, type configurePassport } from '../auth/configure-passport';
import type { ApiError } from '../../shared/api-error';
import { z } from 'zod';
import { publicUserSchema } from '../../shared/public-user-schema';
import { signInBody } from '../../shared/schemas/sign-in-body';
import type { User } from '../entities/user';
import { declareRoute } from '../http/declare-route';
import type { SignInLimiter } from '../auth/sign-in-limiter';
import { toPublicUser } from '../views/to-public-user';
import { clientOf } from '../auth/client-of';
import { sendTooManyAttempts } from '../auth/send-too-many-attempts';

const WRONG: ApiError = { kind: 'wrong-credentials', message: 'That e-mail and password do not match an account.' };
const DEACTIVATED_ACCOUNT: ApiError = {
  kind: 'deactivated',
  message: 'This account is deactivated, so it cannot sign in. Ask an admin of your Sheetkeeper to reactivate it.',
};

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
        403: 'The password is right but the account is deactivated (`deactivated`).',
        429: 'Too many failed attempts from this client or on this account (`too-many-attempts`, with `Retry-After`).',
      },
    },
    async (req, res, { body }, next) => {
      req.body = body;
      const client = clientOf(req);
      const wait = await limiter.admit(body.email, client);
      if (wait > 0) return sendTooManyAttempts(res, wait, 'Too many failed attempts.');
      passport.authenticate(
        'local',
        { session: false },
        (err: unknown, user: User | false, info?: { message?: string }) => {
          if (err) return next(err);
          if (!user) {
            // A deactivated account's right password still opens nothing, so it counts as a failure too.
            const [status, answer] = info?.message === DEACTIVATED ? [403, DEACTIVATED_ACCOUNT] : [401, WRONG];
            limiter.recordFailure(body.email, client).then(() => res.status(status).json(answer), next);
            return;
          }
          // req.logIn regenerates the session id (passport ≥ 0.6) before storing the user.
          req.logIn(user, (loginErr) => {
            if (loginErr) return next(loginErr);
            limiter.recordSuccess(body.email, client).then(() => res.json({ user: toPublicUser(user) }), next);
          });
        },
      )(req, res, next);
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
