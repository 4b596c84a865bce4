import { Check, Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import type { DecisionVersions } from '../../shared/decision-versions';
import { User } from './user';

/**
 * A reviewer's verdict (a decision) on failures of one library within a scope, for the versions
 * `versions` names counted from `targetVersion`; `accepted` ones expire.
 */
@Entity({ name: 'deviations' })
@Index('deviations_match_idx', ['targetKey', 'suiteSlug'])
@Check('deviations_classification_known', "classification IN ('bug', 'convention-difference', 'accepted')")
@Check('deviations_scope_known', "scope IN ('point', 'path', 'suite', 'diagnosis')")
@Check('deviations_versions_known', "versions IN ('this-version', 'this-and-later', 'every-version')")
@Check('deviations_versions_have_version', "versions = 'every-version' OR target_version IS NOT NULL")
export class Deviation {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'text' })
  classification!: 'bug' | 'convention-difference' | 'accepted';

  @Column({ type: 'text' })
  scope!: 'point' | 'path' | 'suite' | 'diagnosis';

  /** The target without its version ("complex.js", "mathjs/number"). */
  @Column({ type: 'text', name: 'target_key' })
  targetKey!: string;

  /** Which versions of the library it covers (shared/decision-versions.ts). */
  @Column({ type: 'text', default: 'every-version' })
  versions!: DecisionVersions;

  /** The version it was given on; null only for decisions recorded before versions were stored. */
  @Column({ type: 'text', name: 'target_version', nullable: true })
  targetVersion!: string | null;

  @Column({ type: 'text', name: 'suite_slug' })
  suiteSlug!: string;

  @Column({ type: 'text', name: 'path_name', nullable: true })
  pathName!: string | null;

  @Column({ type: 'text', name: 'point_key', nullable: true })
  pointKey!: string | null;

  @Column({ type: 'text', name: 'diagnosis_kind', nullable: true })
  diagnosisKind!: string | null;

  @Column({ type: 'text' })
  reason!: string;

  @Column({ type: 'timestamptz', name: 'expires_at', nullable: true })
  expiresAt!: Date | null;

  /** The failure the verdict was given on. */
  @Column({ type: 'bigint', name: 'failure_id', nullable: true })
  failureId!: string | null;

  @ManyToOne(() => User, { nullable: false, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'created_by', foreignKeyConstraintName: 'FK_deviations_created_by' })
  createdBy!: User;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt!: Date;

  @Column({ type: 'timestamptz', name: 'revoked_at', nullable: true })
  revokedAt!: Date | null;
}
