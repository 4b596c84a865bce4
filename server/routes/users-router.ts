import { Router } from 'express';
import { z } from 'zod';
import { cancelledInvitationSchema } from '../../shared/cancelled-invitation-schema';
import { invitationViewSchema } from '../../shared/invitation-view-schema';
import { publicUserSchema } from '../../shared/public-user-schema';
import { ROLES } from '../../shared/roles';
import { idParams } from '../../shared/schemas/id-params';
import { inviteBody } from '../../shared/schemas/invite-body';
import { roleChangeBody } from '../../shared/schemas/role-change-body';
import type { AccountLinks } from '../auth/account-links';
import { LAST_ADMIN_ERROR } from '../auth/last-admin-error';
import type { UserAdmin } from '../auth/user-admin';
import { User } from '../entities/user';
import { declareRoute } from '../http/declare-route';
import type { DataSource } from 'typeorm';
import { toPublicUser } from '../views/to-public-user';

const userAnswer = z.object({ user: publicUserSchema });

/** The admin's side of accounts: the list, roles, invitations (sent and withdrawn), deactivation and password resets. */
export function usersRouter(dataSource: DataSource, admin: UserAdmin, links: AccountLinks): Router {
  const router = Router();
  const users = dataSource.getRepository(User);

  declareRoute(
    router,
    'get',
    '/',
    {
      summary: 'Every user, oldest first',
      access: ['admin'],
      responses: { 200: { description: 'Every user.', schema: z.object({ users: z.array(publicUserSchema) }) } },
    },
    async (_req, res) => {
      const all = await users.find({ order: { createdAt: 'ASC', email: 'ASC' } });
      res.json({ users: all.map(toPublicUser) });
    },
  );

  declareRoute(
    router,
    'get',
    '/invitations',
    {
      summary: 'Invitations that can still be used, newest first',
      access: ['admin'],
      responses: {
        200: { description: 'The open invitations.', schema: z.object({ invitations: z.array(invitationViewSchema) }) },
      },
    },
    async (_req, res) => {
      res.json({ invitations: await links.openInvitations() });
    },
  );

  declareRoute(
    router,
    'post',
    '/invitations',
    {
      summary: 'Invite someone: a one-time link to make their account with a role is mailed to them',
      access: ['admin'],
      body: inviteBody,
      responses: {
        201: {
          description: 'The invitation is queued for mail; an older unused one to the address no longer works.',
          schema: z.object({
            invitation: z.object({ email: z.string(), role: z.enum(ROLES), expiresAt: z.string() }),
          }),
        },
        409: 'The address has an account already.',
      },
    },
    async (req, res, { body }) => {
      res.status(201).json({ invitation: await links.invite(req.user!, body.email, body.role) });
    },
  );

  declareRoute(
    router,
    'post',
    '/invitations/:id/cancel',
    {
      summary: 'Withdraw an invitation before it is used: its link stops working at once',
      access: ['admin'],
      params: idParams,
      responses: {
        200: {
          description: 'The invitation is withdrawn (again, if it already was: the first date is kept).',
          schema: z.object({ invitation: cancelledInvitationSchema }),
        },
        404: 'No invitation with that id.',
        409: 'The invitation was used (its account is deactivated instead), replaced by a newer one, or has expired.',
      },
    },
    async (_req, res, { params: { id } }) => {
      res.json({ invitation: await links.cancelInvitation(id) });
    },
  );

  declareRoute(
    router,
    'patch',
    '/:id',
    {
      summary: "Change a user's role (applies at once)",
      access: ['admin'],
      params: idParams,
      body: roleChangeBody,
      responses: {
        200: { description: 'The user with the new role.', schema: userAnswer },
        404: 'No user with that id.',
        409: LAST_ADMIN_ERROR.message,
      },
    },
    async (_req, res, { params: { id }, body: { role } }) => {
      res.json({ user: toPublicUser(await admin.changeRole(id, role)) });
    },
  );

  declareRoute(
    router,
    'post',
    '/:id/deactivate',
    {
      summary: 'Deactivate a user: no sign-in, and their sessions and API tokens are refused at once',
      access: ['admin'],
      params: idParams,
      responses: {
        200: { description: 'The user, deactivated (again, if they were already).', schema: userAnswer },
        404: 'No user with that id.',
        409: `Your own account, or the last active admin. ${LAST_ADMIN_ERROR.message}`,
      },
    },
    async (req, res, { params: { id } }) => {
      res.json({ user: toPublicUser(await admin.deactivate(req.user!, id)) });
    },
  );

  declareRoute(
    router,
    'post',
    '/:id/reactivate',
    {
      summary: 'Reactivate a user: they can sign in again with their password',
      access: ['admin'],
      params: idParams,
      responses: { 200: { description: 'The user, active.', schema: userAnswer }, 404: 'No user with that id.' },
    },
    async (_req, res, { params: { id } }) => {
      res.json({ user: toPublicUser(await admin.reactivate(id)) });
    },
  );

  declareRoute(
    router,
    'post',
    '/:id/password-reset',
    {
      summary: 'Mail a user a one-time link to choose a new password (their old one works until it is used)',
      access: ['admin'],
      params: idParams,
      responses: {
        201: {
          description: 'The link is queued for mail; an older unused reset of the account no longer works.',
          schema: z.object({ reset: z.object({ email: z.string(), expiresAt: z.string() }) }),
        },
        404: 'No user with that id.',
        409: 'The account is deactivated.',
      },
    },
    async (req, res, { params: { id } }) => {
      res.status(201).json({ reset: await links.reset(req.user!, id) });
    },
  );

  return router;
}
