import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import type { PropertyOutcome } from '../../shared/property-outcome';
import { Run } from './run';
import { Shard } from './shard';

/** One property check of a shard: the law, its pinned seed, and for a failure fast-check's replay path and the shrunk counterexample. */
@Entity({ name: 'property_results' })
@Index('property_results_run_idx', ['run'])
export class PropertyResult {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @ManyToOne(() => Run, { nullable: false, onDelete: 'CASCADE' })
  @JoinColumn({ name: 'run_id', foreignKeyConstraintName: 'FK_property_results_run' })
  run!: Run;

  @ManyToOne(() => Shard, { nullable: false, onDelete: 'CASCADE' })
  @JoinColumn({ name: 'shard_id', foreignKeyConstraintName: 'FK_property_results_shard' })
  shard!: Shard;

  @Column({ type: 'text' })
  law!: string;

  @Column({ type: 'text' })
  kind!: PropertyOutcome['kind'];

  @Column({ type: 'bigint' })
  seed!: string;

  /** The whole outcome as the harness gave it (title, runs, path, counterexample, values, reason). */
  @Column({ type: 'jsonb' })
  outcome!: PropertyOutcome;
}
