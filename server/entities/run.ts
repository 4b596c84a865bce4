import { Check, Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import type { ClassCounts, OutcomeCounts } from '../../shared/run-result';
import type { RunStatus, RunTrigger } from '../../shared/run-status';
import { Plan } from './plan';
import { User } from './user';

/** One execution of a plan: suites × targets split into shards that workers take from the queue. */
@Entity({ name: 'runs' })
@Index('runs_plan_created_idx', ['plan', 'createdAt'])
// One queued or running run per plan: "Run now" twice at once makes one run (run-service.ts).
@Index('runs_one_active_per_plan', ['plan'], { unique: true, where: `status IN ('queued', 'running')` })
@Check('runs_status_known', "status IN ('queued', 'running', 'completed', 'failed', 'cancelled')")
@Check('runs_trigger_known', "trigger IN ('schedule', 'manual', 'api')")
export class Run {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  /** Null once the plan is deleted: the run and its results stay. */
  @ManyToOne(() => Plan, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'plan_id', foreignKeyConstraintName: 'FK_runs_plan' })
  plan!: Plan | null;

  @Column({ type: 'text', name: 'plan_name' })
  planName!: string;

  @Column({ type: 'text' })
  trigger!: RunTrigger;

  @ManyToOne(() => User, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'requested_by', foreignKeyConstraintName: 'FK_runs_requested_by' })
  requestedBy!: User | null;

  @Column({ type: 'text' })
  status!: RunStatus;

  @Column({ type: 'integer', name: 'shards_total' })
  shardsTotal!: number;

  @Column({ type: 'integer', name: 'shards_done', default: 0 })
  shardsDone!: number;

  @Column({ type: 'jsonb' })
  counts!: OutcomeCounts;

  /** Failing points by class, branch and accuracy (shared/run-result.ts ClassCounts). */
  @Column({ type: 'jsonb', name: 'by_class', default: () => `'{"branch": 0, "accuracy": 0}'` })
  byClass!: ClassCounts;

  /**
   * Checks (shards) stopped by an error, by shared/check-stopped-by-error.ts: counted by the shard
   * executor as each shard is stored, so a list of runs judges them without reading their shards.
   */
  @Column({ type: 'integer', name: 'checks_stopped', default: 0 })
  checksStopped!: number;

  /**
   * Checks (shards) whose outcome is `fail`: a failing point, a failed property law or a failed
   * monodromy check. Counted by the shard executor as each shard is stored (migration 1765000000000).
   */
  @Column({ type: 'integer', name: 'checks_failed', default: 0 })
  checksFailed!: number;

  /** Failures new since the previous completed run of the plan, per the regression rule; set when the run completes. */
  @Column({ type: 'integer', nullable: true })
  regressions!: number | null;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt!: Date;

  @Column({ type: 'timestamptz', name: 'started_at', nullable: true })
  startedAt!: Date | null;

  @Column({ type: 'timestamptz', name: 'finished_at', nullable: true })
  finishedAt!: Date | null;
}
