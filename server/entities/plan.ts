import {
  Column,
  CreateDateColumn,
  Entity,
  JoinColumn,
  JoinTable,
  ManyToMany,
  ManyToOne,
  PrimaryGeneratedColumn,
  UpdateDateColumn,
} from 'typeorm';
import { Suite } from './suite';
import { TargetRow } from './target-row';
import { User } from './user';

/**
 * Suites × targets with the people to tell. A run uses each suite's newest approved version
 * at the moment it starts, and records which one it used.
 */
@Entity({ name: 'plans' })
export class Plan {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'text', unique: true })
  name!: string;

  @Column({ type: 'text', default: '' })
  description!: string;

  @Column({ type: 'text', array: true })
  recipients!: string[];

  @ManyToMany(() => Suite)
  @JoinTable({
    name: 'plan_suites',
    joinColumn: { name: 'plan_id', referencedColumnName: 'id', foreignKeyConstraintName: 'FK_plan_suites_plan' },
    inverseJoinColumn: {
      name: 'suite_id',
      referencedColumnName: 'id',
      foreignKeyConstraintName: 'FK_plan_suites_suite',
    },
  })
  suites!: Suite[];

  @ManyToMany(() => TargetRow)
  @JoinTable({
    name: 'plan_targets',
    joinColumn: { name: 'plan_id', referencedColumnName: 'id', foreignKeyConstraintName: 'FK_plan_targets_plan' },
    inverseJoinColumn: {
      name: 'target_name',
      referencedColumnName: 'name',
      foreignKeyConstraintName: 'FK_plan_targets_target',
    },
  })
  targets!: TargetRow[];

  @ManyToOne(() => User, { nullable: false, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'created_by', foreignKeyConstraintName: 'FK_plans_created_by' })
  createdBy!: User;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt!: Date;

  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' })
  updatedAt!: Date;
}
