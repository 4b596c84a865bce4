import { Check, Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import type { DiagnosisKind } from '../../shared/diagnosis';
import type { CheckedScope, ClassCounts, OutcomeCounts } from '../../shared/run-result';
import { Run } from './run';
import { SuiteVersion } from './suite-version';
import { WorkerRow } from './worker-row';

/** One suite version against one target within a run: the unit a worker takes, retried whole. */
@Entity({ name: 'shards' })
@Index('shards_run_idx', ['run'])
@Index('shards_queued_target_idx', ['targetName'], { where: `status = 'queued'` })
@Check('shards_status_known', "status IN ('queued', 'running', 'done', 'cancelled')")
export class Shard {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @ManyToOne(() => Run, { nullable: false, onDelete: 'CASCADE' })
  @JoinColumn({ name: 'run_id', foreignKeyConstraintName: 'FK_shards_run' })
  run!: Run;

  @ManyToOne(() => SuiteVersion, { nullable: false, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'suite_version_id', foreignKeyConstraintName: 'FK_shards_suite_version' })
  suiteVersion!: SuiteVersion;

  @Column({ type: 'text', name: 'suite_slug' })
  suiteSlug!: string;

  @Column({ type: 'text', name: 'target_name' })
  targetName!: string;

  /** The library and its version as the shard found them (a target's name can outlive an upgrade). */
  @Column({ type: 'text', name: 'target_library' })
  targetLibrary!: string;

  @Column({ type: 'text', name: 'target_version' })
  targetVersion!: string;

  @Column({ type: 'text' })
  status!: 'queued' | 'running' | 'done' | 'cancelled';

  /** pass, fail or error for the pair once done. */
  @Column({ type: 'text', nullable: true })
  outcome!: 'pass' | 'fail' | 'error' | null;

  @Column({ type: 'integer', default: 0 })
  attempts!: number;

  @Column({ type: 'jsonb', nullable: true })
  counts!: OutcomeCounts | null;

  /** Failing points by class once done. */
  @Column({ type: 'jsonb', name: 'by_class', nullable: true })
  byClass!: ClassCounts | null;

  @Column({ type: 'jsonb', name: 'by_diagnosis', nullable: true })
  byDiagnosis!: Partial<Record<DiagnosisKind, number>> | null;

  @Column({ type: 'jsonb', nullable: true })
  checked!: CheckedScope | null;

  @Column({ type: 'jsonb', default: () => `'[]'` })
  errors!: string[];

  @Column({ type: 'integer', name: 'duration_ms', nullable: true })
  durationMs!: number | null;

  /** When a worker last took it; the worker's advisory lock says it is still alive (shard-liveness.ts). */
  @Column({ type: 'timestamptz', name: 'claimed_at', nullable: true })
  claimedAt!: Date | null;

  /** The last worker that took it (kept when it is queued again): shown beside the pair on the run page. */
  @ManyToOne(() => WorkerRow, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'worker_id', foreignKeyConstraintName: 'FK_shards_worker' })
  worker!: WorkerRow | null;

  @Column({ type: 'timestamptz', name: 'finished_at', nullable: true })
  finishedAt!: Date | null;
}
