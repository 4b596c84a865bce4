import {
  Check,
  Column,
  CreateDateColumn,
  Entity,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  Unique,
} from 'typeorm';
import type { TargetIdentity } from '../../shared/target-identity';
import type { TargetSource } from '../../shared/target-source';
import type { TargetSourceState } from '../../shared/target-source-states';
import { User } from './user';

/**
 * A target source an admin added on the Libraries screen (docs/libraries-screen.md): the source as
 * given, validated by shared/target-source.ts, and what resolving it in the background found.
 */
@Entity({ name: 'target_sources' })
@Unique('target_sources_source_unique', ['source'])
@Check('target_sources_state_known', "state IN ('resolving', 'ready', 'failed')")
export class TargetSourceRow {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'jsonb' })
  source!: TargetSource;

  @Column({ type: 'text', default: 'resolving' })
  state!: TargetSourceState;

  /** The identities it resolved to (name, library, version, settings, entries); empty until ready. */
  @Column({ type: 'jsonb', default: () => "'[]'" })
  targets!: TargetIdentity[];

  /** Why resolving failed, in the resolver's words. */
  @Column({ type: 'text', nullable: true })
  error!: string | null;

  /** Null once that user is deleted: the source stays. */
  @ManyToOne(() => User, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'added_by', foreignKeyConstraintName: 'FK_target_sources_added_by' })
  addedBy!: User | null;

  @CreateDateColumn({ type: 'timestamptz', name: 'added_at' })
  addedAt!: Date;

  @Column({ type: 'timestamptz', name: 'resolved_at', nullable: true })
  resolvedAt!: Date | null;
}
