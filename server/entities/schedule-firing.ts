import { Column, Entity, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import { Schedule } from './schedule';

/**
 * One due time of a schedule, claimed by the first server process that inserts it: the
 * primary key (schedule, due time) is the lock that keeps several servers from firing the
 * same schedule twice.
 */
@Entity({ name: 'schedule_firings' })
export class ScheduleFiring {
  @PrimaryColumn({ type: 'uuid', name: 'schedule_id' })
  scheduleId!: string;

  @PrimaryColumn({ type: 'timestamptz', name: 'due_at' })
  dueAt!: Date;

  @ManyToOne(() => Schedule, { nullable: false, onDelete: 'CASCADE' })
  @JoinColumn({ name: 'schedule_id', foreignKeyConstraintName: 'FK_schedule_firings_schedule' })
  schedule!: Schedule;

  @Column({ type: 'timestamptz', name: 'fired_at', default: () => 'now()' })
  firedAt!: Date;

  /** The run it started, or why it started none (e.g. the plan has no approved suite left). */
  @Column({ type: 'text', nullable: true })
  outcome!: string | null;
}
