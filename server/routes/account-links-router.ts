import { Router, type Request, type Response } from 'express';
import { z } from 'zod';
import { accountLinkViewSchema } from '../../shared/account-link-view-schema';
import type { ApiError } from '../../shared/api-error';
import { publicUserSchema } from '../../shared/public-user-schema';
import { linkTokenBody } from '../../shared/schemas/link-token-body';
import { useLinkBody } from '../../shared/schemas/use-link-body';
import type { AccountLinks, UnusableLink } from '../auth/account-links';
import { passwords } from '../auth/passwords';
import type { SessionControl } from '../auth/session-control';
import type { SignInLimiter } from '../auth/sign-in-limiter';
import { clientOf } from '../auth/client-of';
import { sendTooManyAttempts } from '../auth/send-too-many-attempts';
import { declareRoute } from '../http/declare-route';
import { toPublicUser } from '../views/to-public-user';

/**
 * The sign-in limiter's "account" for one-time links: every link attempt of a client counts in
 * one pair, so 10 unknown tokens lock that client out of links (and count towards its 100 over
 * all sign-ins) for 15 minutes. Not an e-mail address, so it meets no account's count.
 */
const LINK_ATTEMPTS = 'one-time link';

const isUnusable = (v: object): v is UnusableLink => 'unusable' in v;

/**
 * The public side of invitations and password resets: what a link is (for the join page), and
 * using it. Both go through the sign-in limiter like a sign-in: a client is admitted first, and a
 * token we never made counts as a failed attempt.
 */
export function accountLinksRouter(links: AccountLinks, limiter: SignInLimiter, sessions: SessionControl): Router {
  const router = Router();

  /** The wait before this client may try a link, answered as 429; false when it may go on. */
  const refusedByLimiter = async (req: Request, res: Response): Promise<boolean> => {
    const wait = await limiter.admit(LINK_ATTEMPTS, clientOf(req));
    if (wait <= 0) return false;
    sendTooManyAttempts(res, wait, 'Too many links that Sheetkeeper never sent were tried from here.');
    return true;
  };
  const refuse = async (req: Request, res: Response, link: UnusableLink) => {
    if (link.unknown) await limiter.recordFailure(LINK_ATTEMPTS, clientOf(req));
    res.status(410).json({ kind: 'link-unusable', message: link.unusable } satisfies ApiError);
  };

  declareRoute(
    router,
    'post',
    '/lookup',
    {
      summary: 'What a one-time link (an invitation or a password reset) is, before it is used',
      access: 'public',
      body: linkTokenBody,
      responses: {
        200: { description: 'The link can be used.', schema: z.object({ link: accountLinkViewSchema }) },
        410: 'The link is unknown, used, replaced, withdrawn or expired, or its account is deactivated (`link-unusable`).',
        429: 'Too many unknown links from this client (`too-many-attempts`, with `Retry-After`).',
      },
    },
    async (req, res, { body }) => {
      if (await refusedByLimiter(req, res)) return;
      const found = await links.lookUp(body.token);
      if (isUnusable(found)) return refuse(req, res, found);
      res.json({ link: found });
    },
  );

  declareRoute(
    router,
    'post',
    '/use',
    {
      summary: 'Use a one-time link: set the password (and make the invited account); signs in and ends other sessions',
      access: 'public',
      body: useLinkBody,
      responses: {
        200: {
          description: 'Done; the session cookie is set for the account, and its other sessions have ended.',
          schema: z.object({ user: publicUserSchema }),
        },
        409: 'The invited address has an account already.',
        410: 'The link is unknown, used, replaced, withdrawn or expired, or its account is deactivated (`link-unusable`).',
        429: 'Too many unknown links from this client (`too-many-attempts`, with `Retry-After`).',
      },
    },
    async (req, res, { body }, next) => {
      if (await refusedByLimiter(req, res)) return;
      // Looked up first, so a dead link costs no bcrypt; `use` checks it again under a lock.
      const before = await links.lookUp(body.token);
      if (isUnusable(before)) return refuse(req, res, before);
      const outcome = await links.use(body.token, await passwords.hash(body.password), body.displayName);
      if (isUnusable(outcome)) return refuse(req, res, outcome);
      await sessions.endSessionsOf(outcome.id);
      // req.logIn regenerates the session id (passport ≥ 0.6) before storing the user.
      req.logIn(outcome, (err) => (err ? next(err) : res.json({ user: toPublicUser(outcome) })));
    },
  );

  return router;
}
