import { Check, Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import type { Suite as SuiteBody } from '../../shared/schemas/suite-schema';
import type { SuiteStatus } from '../../shared/suite-status';
import { Suite } from './suite';
import { User } from './user';

/** One version of a suite: the validated suite body, its review state, author (its last editor) and reviewer. */
@Entity({ name: 'suite_versions' })
@Index('suite_versions_suite_version_unique', ['suite', 'version'], { unique: true })
@Index('suite_versions_status_idx', ['status'])
@Check('suite_versions_status_known', "status IN ('draft', 'submitted', 'approved', 'changes-requested', 'retired')")
@Check('suite_versions_version_positive', 'version >= 1')
export class SuiteVersion {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @ManyToOne(() => Suite, (s) => s.versions, { nullable: false, onDelete: 'CASCADE' })
  @JoinColumn({ name: 'suite_id', foreignKeyConstraintName: 'FK_suite_versions_suite' })
  suite!: Suite;

  @Column({ type: 'integer' })
  version!: number;

  @Column({ type: 'text' })
  status!: SuiteStatus;

  /** The suite as validated by the shared schema, with `version` set to this row's version. */
  @Column({ type: 'jsonb' })
  body!: SuiteBody;

  @ManyToOne(() => User, { nullable: false, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'author_id', foreignKeyConstraintName: 'FK_suite_versions_author' })
  author!: User;

  /**
   * The author this version had before its last editor, when that editor was someone else: editing
   * another person's draft makes you its author (four eyes follow the last editor). Null when the
   * author wrote it alone.
   */
  @ManyToOne(() => User, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'taken_over_from_id', foreignKeyConstraintName: 'FK_suite_versions_taken_over_from' })
  takenOverFrom!: User | null;

  @ManyToOne(() => User, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'reviewer_id', foreignKeyConstraintName: 'FK_suite_versions_reviewer' })
  reviewer!: User | null;

  @Column({ type: 'text', name: 'review_comment', nullable: true })
  reviewComment!: string | null;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt!: Date;

  @Column({ type: 'timestamptz', name: 'submitted_at', nullable: true })
  submittedAt!: Date | null;

  @Column({ type: 'timestamptz', name: 'reviewed_at', nullable: true })
  reviewedAt!: Date | null;
}
