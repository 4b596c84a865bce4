import { randomBytes } from 'node:crypto';
import type { DataSource, EntityManager } from 'typeorm';
import type { AccountLinkKind } from '../../shared/account-link-kinds';
import type { AccountLinkView } from '../../shared/account-link-view';
import type { CancelledInvitation } from '../../shared/cancelled-invitation';
import type { InvitationView } from '../../shared/invitation-view';
import type { Role } from '../../shared/roles';
import { LINK_TOKEN_PREFIX } from '../../shared/schemas/link-token-schema';
import { AccountLink } from '../entities/account-link';
import { User } from '../entities/user';
import { HttpError } from '../http/http-error';
import { InputError } from '../http/input-error';
import { accountLinkMail } from '../mail/account-link-mail';
import { enqueueMail } from '../mail/enqueue-mail';
import { ACCOUNT_LINK_LIFETIME_HOURS } from '../../shared/account-link-lifetime-hours';
import { hashToken } from './hash-token';

/** A link that cannot be used, and whether its token was one we never made (a guess, for the sign-in limiter). */
export interface UnusableLink {
  unusable: string;
  unknown: boolean;
}

const nameOf = (u: User) => `${u.displayName} (${u.email})`;
const day = (d: Date) => d.toISOString().slice(0, 10);

/**
 * One-time links an admin has mailed: invitations (an address and a role; the account is made
 * when the link is used) and password resets. The token exists in the mail only; the table keeps
 * its SHA-256. A link works once, until it expires, and only while it is the newest of its kind
 * for its address; using it signs the person in and ends their other sessions.
 */
export class AccountLinks {
  constructor(
    private readonly dataSource: DataSource,
    /** Base of the link in the mail (config.appUrl). */
    private readonly appUrl: string,
  ) {}

  /** Mails an invitation to `email` with `role`; an older unused invitation to it stops working. */
  async invite(admin: User, email: string, role: Role): Promise<{ email: string; role: Role; expiresAt: string }> {
    return this.dataSource.transaction(async (tx) => {
      // Serialises invitations to one address, so "the newest one works" has one answer.
      await tx.query(`SELECT pg_advisory_xact_lock(hashtext('account-link:' || $1))`, [email]);
      const existing = await tx.getRepository(User).findOneBy({ email });
      if (existing)
        throw new HttpError(409, {
          kind: 'conflict',
          // A deactivated colleague is brought back by Reactivate, not by changing a role they cannot use.
          message: existing.deactivatedAt
            ? `${email} has an account already (${existing.displayName}), deactivated: reactivate it in the list instead; their role and password come back with it.`
            : `${email} has an account already (${existing.displayName}); change its role in the list instead.`,
        });
      const expiresAt = await this.issue(tx, admin, { kind: 'invitation', email, role, user: null });
      return { email, role, expiresAt: expiresAt.toISOString() };
    });
  }

  /** Mails a password-reset link to the account `userId`; an older unused reset of it stops working. */
  async reset(admin: User, userId: string): Promise<{ email: string; expiresAt: string }> {
    return this.dataSource.transaction(async (tx) => {
      const user = await tx.getRepository(User).findOne({ where: { id: userId }, lock: { mode: 'pessimistic_write' } });
      if (!user) throw new HttpError(404, { kind: 'not-found', message: 'No user with that id.' });
      if (user.deactivatedAt)
        throw new HttpError(409, {
          kind: 'conflict',
          message: `${user.displayName}'s account is deactivated; reactivate it before sending a reset.`,
        });
      const expiresAt = await this.issue(tx, admin, {
        kind: 'password-reset',
        email: user.email,
        role: user.role,
        user,
      });
      return { email: user.email, expiresAt: expiresAt.toISOString() };
    });
  }

  /**
   * Withdraws the unused invitation `id`: its link stops working at once (the row is locked, so a
   * use at the same moment either makes the account first, and this answers 409, or finds the
   * link withdrawn). Withdrawing it again answers the first withdrawal's date, so two admins who
   * both press it both see it withdrawn. A used, replaced or expired invitation is 409 with the
   * reason: its link already does not work, or made an account that only deactivation stops.
   */
  async cancelInvitation(id: string): Promise<CancelledInvitation> {
    return this.dataSource.transaction(async (tx) => {
      const links = tx.getRepository(AccountLink);
      const link = await links.findOne({ where: { id, kind: 'invitation' }, lock: { mode: 'pessimistic_write' } });
      if (!link) throw new HttpError(404, { kind: 'not-found', message: 'No invitation with that id.' });
      const conflict = (message: string) => new HttpError(409, { kind: 'conflict', message });
      if (link.usedAt)
        throw conflict(
          `The invitation to ${link.email} was used on ${day(link.usedAt)} and made an account; deactivate that account instead.`,
        );
      if (!link.cancelledAt) {
        if (link.replacedAt)
          throw conflict(
            `The invitation to ${link.email} was replaced by a newer one on ${day(link.replacedAt)}; cancel the newer one instead.`,
          );
        if (link.expiresAt <= new Date())
          throw conflict(
            `The invitation to ${link.email} expired on ${day(link.expiresAt)}; its link no longer works, so there is nothing to cancel.`,
          );
        link.cancelledAt = new Date();
        await links.update(link.id, { cancelledAt: link.cancelledAt });
      }
      return { id: link.id, email: link.email, cancelledAt: link.cancelledAt.toISOString() };
    });
  }

  /** Invitations that can still be used (not used, replaced, withdrawn or expired), newest first. */
  async openInvitations(): Promise<InvitationView[]> {
    const open = await this.dataSource
      .getRepository(AccountLink)
      .createQueryBuilder('link')
      .innerJoinAndSelect('link.createdBy', 'admin')
      .where(
        `link.kind = 'invitation' AND link.used_at IS NULL AND link.replaced_at IS NULL AND link.cancelled_at IS NULL AND link.expires_at > now()`,
      )
      .orderBy('link.created_at', 'DESC')
      .getMany();
    return open.map((link) => ({
      id: link.id,
      email: link.email,
      role: link.role,
      sentBy: nameOf(link.createdBy),
      sentAt: link.createdAt.toISOString(),
      expiresAt: link.expiresAt.toISOString(),
    }));
  }

  /** What the join page shows for `token`, or why it cannot be used. */
  async lookUp(token: string): Promise<AccountLinkView | UnusableLink> {
    const link = await this.dataSource.getRepository(AccountLink).findOne({
      where: { tokenHash: hashToken(token) },
      relations: { user: true, createdBy: true },
    });
    const refusal = refusalFor(link, new Date());
    if (refusal) return refusal;
    return view(link!);
  }

  /**
   * Uses `token`: an invitation makes the account (named `displayName`) with its role, a reset
   * sets the password. Either way the link is spent. `passwordHash` is made by the caller
   * before, so bcrypt's ~150 ms never runs inside the transaction.
   */
  async use(token: string, passwordHash: string, displayName: string | undefined): Promise<User | UnusableLink> {
    return this.dataSource.transaction(async (tx) => {
      const links = tx.getRepository(AccountLink);
      const users = tx.getRepository(User);
      const hash = hashToken(token);
      // Rows are locked users first, then links, the order a deactivation takes them in
      // (user-admin.ts), so the two never wait on each other: a reset's account is locked before
      // its link, and a deactivation that comes in between is seen below.
      const first = await links.findOne({ where: { tokenHash: hash }, relations: { user: true } });
      if (first?.user) await users.findOne({ where: { id: first.user.id }, lock: { mode: 'pessimistic_write' } });
      // Locked, then read again with its relations: two uses of one link at once spend it once.
      const locked = await links.findOne({ where: { tokenHash: hash }, lock: { mode: 'pessimistic_write' } });
      const link =
        locked && (await links.findOne({ where: { id: locked.id }, relations: { user: true, createdBy: true } }));
      const refusal = refusalFor(link, new Date());
      if (refusal) return refusal;
      const now = new Date();
      let user: User;
      if (link!.kind === 'invitation') {
        if (displayName === undefined)
          throw new InputError([{ field: 'body.displayName', rule: 'is required for an invitation' }]);
        const taken = new HttpError(409, {
          kind: 'conflict',
          message: `${link!.email} has an account already: sign in with it instead.`,
        });
        if (await users.findOneBy({ email: link!.email })) throw taken;
        // The unique address is the last word if an account for it was made in the meantime.
        user = await users
          .save(users.create({ email: link!.email, displayName, role: link!.role, passwordHash, deactivatedAt: null }))
          .catch((e: unknown) => {
            throw (e as { driverError?: { code?: string } }).driverError?.code === '23505' ? taken : e;
          });
      } else {
        // Only the hash is written: a save of the whole row could undo a change made meanwhile.
        await users.update(link!.user!.id, { passwordHash });
        user = await users.findOneByOrFail({ id: link!.user!.id });
      }
      await links.update(link!.id, { usedAt: now, user });
      return user;
    });
  }

  /** Stores a new link (its hash), voids the older unused ones it replaces, and queues its mail in `tx`. */
  private async issue(
    tx: EntityManager,
    admin: User,
    what: { kind: AccountLinkKind; email: string; role: Role; user: User | null },
  ): Promise<Date> {
    const token = `${LINK_TOKEN_PREFIX}${randomBytes(32).toString('base64url')}`;
    const expiresAt = new Date(Date.now() + ACCOUNT_LINK_LIFETIME_HOURS[what.kind] * 3600 * 1000);
    await tx
      .getRepository(AccountLink)
      .createQueryBuilder()
      .update()
      .set({ replacedAt: () => 'now()' })
      // A withdrawn invitation stays withdrawn: its join page keeps saying so after a new one is sent.
      .where('kind = :kind AND email = :email AND used_at IS NULL AND replaced_at IS NULL AND cancelled_at IS NULL', {
        kind: what.kind,
        email: what.email,
      })
      .execute();
    await tx.getRepository(AccountLink).insert({
      kind: what.kind,
      tokenHash: hashToken(token),
      email: what.email,
      role: what.role,
      user: what.user,
      createdBy: admin,
      expiresAt,
      usedAt: null,
      replacedAt: null,
      cancelledAt: null,
    });
    const link = `${this.appUrl}/join?token=${token}`;
    await enqueueMail(
      tx,
      accountLinkMail({ kind: what.kind, to: what.email, sentBy: nameOf(admin), role: what.role, link, expiresAt }),
    );
    return expiresAt;
  }
}

function view(link: AccountLink): AccountLinkView {
  return {
    kind: link.kind,
    email: link.email,
    role: link.kind === 'invitation' ? link.role : link.user!.role,
    displayName: link.kind === 'invitation' ? null : link.user!.displayName,
    sentBy: nameOf(link.createdBy),
    expiresAt: link.expiresAt.toISOString(),
  };
}

/** Why `link` cannot be used at `now`, in words that say whom to ask; null when it can. */
function refusalFor(link: AccountLink | null, now: Date): UnusableLink | null {
  if (!link)
    return {
      unknown: true,
      unusable:
        'This link is not one Sheetkeeper sent, or only part of it was copied. Open the link from the mail again, or ask an admin of your Sheetkeeper for a new one.',
    };
  const what = link.kind === 'invitation' ? 'invitation' : 'password-reset link';
  const ask = `ask ${nameOf(link.createdBy)} for a new one`;
  if (link.usedAt)
    return {
      unknown: false,
      unusable: `This ${what} was used on ${day(link.usedAt)}: sign in with the password chosen then, or ${ask}.`,
    };
  // Before "replaced": a deactivation voids the account's links too, and this is the reason to tell.
  if (link.user?.deactivatedAt)
    return {
      unknown: false,
      unusable: `This account is deactivated, so the link cannot be used: ask ${nameOf(link.createdBy)} to reactivate it.`,
    };
  // Said as plainly as "expired": nothing about who withdrew it or why reaches the link's holder.
  if (link.cancelledAt)
    return {
      unknown: false,
      unusable: `This ${what} was withdrawn on ${day(link.cancelledAt)}: ${ask}.`,
    };
  if (link.replacedAt)
    return {
      unknown: false,
      unusable: `This ${what} was replaced by a newer one on ${day(link.replacedAt)}: use the link in the newest mail, or ${ask}.`,
    };
  if (link.expiresAt <= now)
    return { unknown: false, unusable: `This ${what} expired on ${day(link.expiresAt)}: ${ask}.` };
  return null;
}
