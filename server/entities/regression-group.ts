import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { Run } from './run';

/**
 * The regressions of one completed run, counted per (target key, suite, path, diagnosis):
 * written once by markRegressions when the run completes, so the Overview counts a
 * subscriber's regressions from a few rows instead of reading every regressed failure
 * (20,000 of them took 235–340 ms a request; see load-overview.ts).
 */
@Entity({ name: 'regression_groups' })
@Index('regression_groups_run_idx', ['run', 'targetKey'])
export class RegressionGroup {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @ManyToOne(() => Run, { nullable: false, onDelete: 'CASCADE' })
  @JoinColumn({ name: 'run_id', foreignKeyConstraintName: 'FK_regression_groups_run' })
  run!: Run;

  @Column({ type: 'text', name: 'target_key' })
  targetKey!: string;

  /** The target's version: a decision may cover some versions of a library only. */
  @Column({ type: 'text', name: 'target_version' })
  targetVersion!: string;

  @Column({ type: 'text', name: 'suite_slug' })
  suiteSlug!: string;

  @Column({ type: 'text', name: 'path_name' })
  pathName!: string;

  @Column({ type: 'text', name: 'diagnosis_kind', nullable: true })
  diagnosisKind!: string | null;

  @Column({ type: 'integer' })
  count!: number;
}
