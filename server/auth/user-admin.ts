import type { DataSource, EntityManager } from 'typeorm';
import type { Role } from '../../shared/roles';
import { AccountLink } from '../entities/account-link';
import { User } from '../entities/user';
import { HttpError } from '../http/http-error';
import { LAST_ADMIN_ERROR } from './last-admin-error';
import type { SessionControl } from './session-control';

/**
 * What an admin changes about an account: its role, and whether it is active. Each change reads,
 * checks and writes in one transaction that locks the active admins' rows, so two admins demoting
 * or deactivating each other at once cannot leave the team without one: the second waits for the
 * first and then sees one admin fewer.
 */
export class UserAdmin {
  constructor(
    private readonly dataSource: DataSource,
    private readonly sessions: SessionControl,
  ) {}

  async changeRole(id: string, role: Role): Promise<User> {
    const user = await this.dataSource.transaction(async (tx) => {
      const { user, activeAdmins } = await lockedWithAdmins(tx, id);
      if (isActiveAdmin(user) && role !== 'admin' && activeAdmins <= 1) throw new HttpError(409, LAST_ADMIN_ERROR);
      user.role = role;
      return tx.getRepository(User).save(user);
    });
    // After the commit, so no request can cache the old role again in between.
    this.sessions.forgetUser(id);
    return user;
  }

  /** Deactivates `id`: it cannot sign in, its sessions end and its API tokens are refused from now on. */
  async deactivate(actor: User, id: string): Promise<User> {
    if (actor.id === id)
      throw new HttpError(409, {
        kind: 'conflict',
        message: 'You cannot deactivate your own account; ask another admin to do it.',
      });
    const user = await this.dataSource.transaction(async (tx) => {
      const { user, activeAdmins } = await lockedWithAdmins(tx, id);
      if (user.deactivatedAt) return user;
      if (isActiveAdmin(user) && activeAdmins <= 1) throw new HttpError(409, LAST_ADMIN_ERROR);
      user.deactivatedAt = new Date();
      // Its unused reset links die with it; reactivating does not bring them back.
      await tx
        .getRepository(AccountLink)
        .createQueryBuilder()
        .update()
        .set({ replacedAt: () => 'now()' })
        .where('user_id = :id AND used_at IS NULL AND replaced_at IS NULL', { id })
        .execute();
      return tx.getRepository(User).save(user);
    });
    await this.sessions.endSessionsOf(id);
    return user;
  }

  /** Lets `id` sign in again (with its old password; sessions ended by the deactivation stay ended). */
  async reactivate(id: string): Promise<User> {
    const user = await this.dataSource.transaction(async (tx) => {
      const { user } = await lockedWithAdmins(tx, id);
      user.deactivatedAt = null;
      return tx.getRepository(User).save(user);
    });
    this.sessions.forgetUser(id);
    return user;
  }
}

const isActiveAdmin = (u: User) => u.role === 'admin' && u.deactivatedAt === null;

/** Locks the active admins' rows and the user's own; 404 when there is no such user. */
async function lockedWithAdmins(tx: EntityManager, id: string): Promise<{ user: User; activeAdmins: number }> {
  const repo = tx.getRepository(User);
  const admins: unknown[] = await tx.query(
    `SELECT id FROM users WHERE role = 'admin' AND deactivated_at IS NULL ORDER BY id FOR UPDATE`,
  );
  const user = await repo.findOne({ where: { id }, lock: { mode: 'pessimistic_write' } });
  if (!user) throw new HttpError(404, { kind: 'not-found', message: 'No user with that id.' });
  return { user, activeAdmins: admins.length };
}
