import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';

/**
 * A process with shard workers (the server or `npm run worker`, on any machine), as it announced
 * itself (worker-registration.ts). Rows are kept after the process stops, so a shard still names
 * the worker that ran it.
 */
@Entity({ name: 'workers' })
export class WorkerRow {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  /** Readable and unique enough to tell processes apart: "host:pid". */
  @Column({ type: 'text' })
  label!: string;

  /** The target names it takes shards for: what it has, narrowed by SHEETKEEPER_WORKER_TARGETS. */
  @Column({ type: 'text', array: true })
  targets!: string[];

  @Column({ type: 'timestamptz', name: 'started_at', default: () => 'now()' })
  startedAt!: Date;

  @Column({ type: 'timestamptz', name: 'heartbeat_at', default: () => 'now()' })
  heartbeatAt!: Date;

  @Column({ type: 'timestamptz', name: 'stopped_at', nullable: true })
  stoppedAt!: Date | null;
}
