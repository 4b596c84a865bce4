import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import type { DiagnosisKind } from '../../shared/diagnosis';
import type { MonodromyCheck, OutcomeCounts } from '../../shared/run-result';
import type { SkipReason } from '../../shared/skip-reason';
import { Run } from './run';
import { Shard } from './shard';

/** One path of one shard, summarised: counts, jumps and monodromy — the passing points live only here. */
@Entity({ name: 'path_summaries' })
@Index('path_summaries_run_idx', ['run'])
export class PathSummary {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @ManyToOne(() => Run, { nullable: false, onDelete: 'CASCADE' })
  @JoinColumn({ name: 'run_id', foreignKeyConstraintName: 'FK_path_summaries_run' })
  run!: Run;

  @ManyToOne(() => Shard, { nullable: false, onDelete: 'CASCADE' })
  @JoinColumn({ name: 'shard_id', foreignKeyConstraintName: 'FK_path_summaries_shard' })
  shard!: Shard;

  @Column({ type: 'text', name: 'path_name' })
  pathName!: string;

  @Column({ type: 'text' })
  kind!: string;

  @Column({ type: 'integer' })
  points!: number;

  @Column({ type: 'jsonb' })
  counts!: OutcomeCounts;

  @Column({ type: 'jsonb', name: 'by_diagnosis' })
  byDiagnosis!: Partial<Record<DiagnosisKind, number>>;

  @Column({ type: 'jsonb', nullable: true })
  jumps!: { expected: number[]; library: number[] } | null;

  @Column({ type: 'jsonb', nullable: true })
  monodromy!: MonodromyCheck | null;

  @Column({ type: 'jsonb' })
  skipped!: SkipReason[];

  @Column({ type: 'text', nullable: true })
  error!: string | null;
}
