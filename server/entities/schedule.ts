import {
  Column,
  CreateDateColumn,
  Entity,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  UpdateDateColumn,
} from 'typeorm';
import { Plan } from './plan';
import { User } from './user';

/** When a plan runs by itself: a cron expression read in a time zone. */
@Entity({ name: 'schedules' })
export class Schedule {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @ManyToOne(() => Plan, { nullable: false, onDelete: 'CASCADE' })
  @JoinColumn({ name: 'plan_id', foreignKeyConstraintName: 'FK_schedules_plan' })
  plan!: Plan;

  @Column({ type: 'text' })
  cron!: string;

  @Column({ type: 'text', name: 'time_zone' })
  timeZone!: string;

  @Column({ type: 'boolean', default: true })
  enabled!: boolean;

  @ManyToOne(() => User, { nullable: false, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'created_by', foreignKeyConstraintName: 'FK_schedules_created_by' })
  createdBy!: User;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt!: Date;

  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' })
  updatedAt!: Date;
}
