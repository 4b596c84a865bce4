import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { User } from './user';

/**
 * A personal token for CI (`Authorization: Bearer skt_…`). Only its SHA-256 is stored: the
 * token is 32 random bytes, so a fast hash is as safe as a slow one and costs nothing per call.
 */
@Entity({ name: 'api_tokens' })
@Index('api_tokens_hash_unique', ['tokenHash'], { unique: true })
export class ApiToken {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @ManyToOne(() => User, { nullable: false, onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id', foreignKeyConstraintName: 'FK_api_tokens_user' })
  user!: User;

  @Column({ type: 'text' })
  name!: string;

  @Column({ type: 'text', name: 'token_hash' })
  tokenHash!: string;

  /** The first characters, so a person can tell tokens apart without the secret. */
  @Column({ type: 'text' })
  prefix!: string;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt!: Date;

  @Column({ type: 'timestamptz', name: 'last_used_at', nullable: true })
  lastUsedAt!: Date | null;

  @Column({ type: 'timestamptz', name: 'revoked_at', nullable: true })
  revokedAt!: Date | null;
}
