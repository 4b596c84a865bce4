import { Check, Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { Role } from '../../shared/roles';

@Entity({ name: 'users' })
@Check('users_email_lower', 'email = lower(email)')
@Check('users_role_known', "role IN ('admin', 'maintainer', 'reviewer', 'contributor')")
export class User {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  /** Stored lower-cased; unique. */
  @Column({ type: 'text', unique: true })
  email!: string;

  @Column({ type: 'text', name: 'display_name' })
  displayName!: string;

  @Column({ type: 'text', name: 'password_hash' })
  passwordHash!: string;

  @Column({ type: 'text' })
  role!: Role;

  /** Set by an admin: the account cannot sign in, and its sessions and API tokens are refused. */
  @Column({ type: 'timestamptz', name: 'deactivated_at', nullable: true })
  deactivatedAt!: Date | null;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt!: Date;

  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' })
  updatedAt!: Date;
}
