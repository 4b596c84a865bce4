import { Column, Entity, PrimaryColumn } from 'typeorm';

/** A row of the `targets` table: one library at one version with its settings (docs/vocabulary.md), as found installed by the harness. */
@Entity({ name: 'targets' })
export class TargetRow {
  /** The harness's name for it, e.g. "complex.js@2.4.1" or "mathjs@15.2.0/number/predictable". */
  @PrimaryColumn({ type: 'text' })
  name!: string;

  @Column({ type: 'text' })
  library!: string;

  @Column({ type: 'text' })
  version!: string;

  @Column({ type: 'jsonb' })
  settings!: Record<string, string | number | boolean>;

  /** False once a server start no longer finds it installed; plans that name it then say so. */
  @Column({ type: 'boolean' })
  installed!: boolean;

  @Column({ type: 'timestamptz', name: 'last_seen_at' })
  lastSeenAt!: Date;
}
