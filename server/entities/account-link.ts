import { Check, Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { ACCOUNT_LINK_KINDS, type AccountLinkKind } from '../../shared/account-link-kinds';
import type { Role } from '../../shared/roles';
import { User } from './user';

/**
 * A one-time link an admin had mailed: an invitation (an e-mail and a role, no account yet) or a
 * password reset (an account). Only the token's SHA-256 is kept: the token is 32 random bytes, so
 * a fast hash is as safe as a slow one, and a copy of this table opens no account. A link works
 * once, until `expires_at`, and not after a newer link of its kind for the same address
 * (`replaced_at`) or, for an invitation, after an admin withdrew it (`cancelled_at`).
 */
@Entity({ name: 'account_links' })
@Index('account_links_hash_unique', ['tokenHash'], { unique: true })
@Index('account_links_email_idx', ['email'])
@Check('account_links_kind_known', `kind IN (${ACCOUNT_LINK_KINDS.map((k) => `'${k}'`).join(', ')})`)
@Check('account_links_email_lower', 'email = lower(email)')
@Check('account_links_role_known', "role IN ('admin', 'maintainer', 'reviewer', 'contributor')")
@Check('account_links_cancel_invitation', "cancelled_at IS NULL OR kind = 'invitation'")
export class AccountLink {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'text' })
  kind!: AccountLinkKind;

  @Column({ type: 'text', name: 'token_hash' })
  tokenHash!: string;

  /** Whom it was mailed to: the invited address, or the account's address at the time of a reset. */
  @Column({ type: 'text' })
  email!: string;

  /** The role an invitation gives; a reset keeps the account's and records it here for the page. */
  @Column({ type: 'text' })
  role!: Role;

  /** The account a reset is for, or the account an invitation made once used. */
  @ManyToOne(() => User, { nullable: true, onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id', foreignKeyConstraintName: 'FK_account_links_user' })
  user!: User | null;

  @ManyToOne(() => User, { nullable: false, onDelete: 'CASCADE' })
  @JoinColumn({ name: 'created_by_id', foreignKeyConstraintName: 'FK_account_links_created_by' })
  createdBy!: User;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt!: Date;

  @Column({ type: 'timestamptz', name: 'expires_at' })
  expiresAt!: Date;

  @Column({ type: 'timestamptz', name: 'used_at', nullable: true })
  usedAt!: Date | null;

  /** When a newer link of the same kind to the same address (or a deactivation) made this one void. */
  @Column({ type: 'timestamptz', name: 'replaced_at', nullable: true })
  replacedAt!: Date | null;

  /** When an admin withdrew this invitation before it was used (invitations only). */
  @Column({ type: 'timestamptz', name: 'cancelled_at', nullable: true })
  cancelledAt!: Date | null;
}
