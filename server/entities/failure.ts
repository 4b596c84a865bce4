import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import type { Diagnosis, DiagnosisKind } from '../../shared/diagnosis';
import type { DiagnosisClass } from '../../shared/diagnosis-class';
import type { StepValue } from '../../shared/run-result';
import type { WireComplex } from '../../shared/wire-complex';
import { Run } from './run';
import { Shard } from './shard';

/**
 * One point that did not pass, stored in full: the input bits, both values, the diagnosis,
 * both one-sided limits on a cut, the rule and a reproducer. Passing points are not stored one
 * by one; their paths are summarised in path_summaries.
 */
@Entity({ name: 'failures' })
@Index('failures_run_idx', ['run', 'id'])
@Index('failures_point_key_idx', ['pointKey'])
@Index('failures_run_diagnosis_idx', ['run', 'diagnosisKind', 'id'])
@Index('failures_run_suite_idx', ['run', 'suiteSlug', 'id'])
// Expression and partial indexes TypeORM cannot describe: kept by the migration, skipped by the schema comparison.
@Index('failures_run_rank_idx', { synchronize: false })
@Index('failures_run_rank_ulps_idx', { synchronize: false })
@Index('failures_run_kind_rank_idx', { synchronize: false })
@Index('failures_run_kind_rank_ulps_idx', { synchronize: false })
@Index('failures_later_labels_idx', { synchronize: false })
@Index('failures_run_new_idx', { synchronize: false })
export class Failure {
  @PrimaryGeneratedColumn('identity', { type: 'bigint', generatedIdentity: 'ALWAYS' })
  id!: string;

  @ManyToOne(() => Run, { nullable: false, onDelete: 'CASCADE' })
  @JoinColumn({ name: 'run_id', foreignKeyConstraintName: 'FK_failures_run' })
  run!: Run;

  @ManyToOne(() => Shard, { nullable: false, onDelete: 'CASCADE' })
  @JoinColumn({ name: 'shard_id', foreignKeyConstraintName: 'FK_failures_shard' })
  shard!: Shard;

  @Column({ type: 'text', name: 'suite_slug' })
  suiteSlug!: string;

  @Column({ type: 'integer', name: 'suite_version' })
  suiteVersion!: number;

  @Column({ type: 'text', name: 'target_name' })
  targetName!: string;

  @Column({ type: 'text', name: 'target_library' })
  targetLibrary!: string;

  @Column({ type: 'text', name: 'target_version' })
  targetVersion!: string;

  @Column({ type: 'text' })
  convention!: string;

  @Column({ type: 'text', name: 'path_name' })
  pathName!: string;

  @Column({ type: 'integer', name: 'point_index' })
  pointIndex!: number;

  @Column({ type: 'double precision' })
  t!: number;

  @Column({ type: 'text', nullable: true })
  label!: string | null;

  @Column({ type: 'jsonb' })
  z!: WireComplex;

  @Column({ type: 'jsonb', name: 'z_hex' })
  zHex!: WireComplex;

  /** The same point across runs and versions: suite, path and the input's exact bits. */
  @Column({ type: 'text', name: 'point_key' })
  pointKey!: string;

  @Column({ type: 'jsonb', nullable: true })
  expected!: WireComplex | null;

  @Column({ type: 'jsonb', nullable: true })
  actual!: WireComplex | null;

  /** fail, error or skipped (a passing point is never stored here; a not-applicable one is only counted). */
  @Column({ type: 'text', name: 'outcome_kind' })
  outcomeKind!: 'fail' | 'error' | 'skipped' | 'not-applicable';

  @Column({ type: 'text', name: 'diagnosis_kind', nullable: true })
  diagnosisKind!: DiagnosisKind | null;

  @Column({ type: 'jsonb', nullable: true })
  diagnosis!: Diagnosis | null;

  /** Every label of the point, the leading one (`diagnosis`) first; empty for an error or a skipped point. */
  @Column({ type: 'jsonb', default: () => `'[]'` })
  labels!: Diagnosis[];

  /** branch when any label is a branch finding, else accuracy (shared/point-class.ts); null for an error or a skipped point. */
  @Column({ type: 'text', name: 'finding_class', nullable: true })
  findingClass!: DiagnosisClass | null;

  @Column({ type: 'double precision', nullable: true })
  ulps!: number | null;

  @Column({ type: 'double precision', name: 'relative_error', nullable: true })
  relativeError!: number | null;

  @Column({ type: 'text' })
  rule!: string;

  @Column({ type: 'text' })
  reproducer!: string;

  @Column({ type: 'jsonb', nullable: true })
  limits!: { sides: [string, string]; values: [WireComplex, WireComplex] } | null;

  /** A composed subject's intermediate values, library beside reference. */
  @Column({ type: 'jsonb', nullable: true })
  steps!: StepValue[] | null;

  /** The index in `steps` of the first step whose library value left the reference's. */
  @Column({ type: 'integer', name: 'first_left_step', nullable: true })
  firstLeftStep!: number | null;

  /** Where conventions disagree about the value, the rule that makes the expected one. */
  @Column({ type: 'text', nullable: true })
  choice!: string | null;

  /** Set when the run completes: this point passed in the previous completed run of the plan. */
  @Column({ type: 'boolean', name: 'is_regression', default: false })
  isRegression!: boolean;
}
