import { Check, Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { SuiteVersion } from './suite-version';
import { User } from './user';

/** A file someone uploaded and what became of it: a suite file, or a table of reference values with its check. */
@Entity({ name: 'uploads' })
@Check('uploads_kind_known', "kind IN ('suite-file', 'reference-table')")
export class Upload {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'text' })
  kind!: 'suite-file' | 'reference-table';

  @ManyToOne(() => SuiteVersion, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'suite_version_id', foreignKeyConstraintName: 'FK_uploads_suite_version' })
  suiteVersion!: SuiteVersion | null;

  @Column({ type: 'text' })
  filename!: string;

  @Column({ type: 'integer' })
  bytes!: number;

  /** For a reference table: the ReferenceTableCheck; for a suite file: the version it made. */
  @Column({ type: 'jsonb' })
  summary!: Record<string, unknown>;

  @ManyToOne(() => User, { nullable: false, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'uploaded_by', foreignKeyConstraintName: 'FK_uploads_uploaded_by' })
  uploadedBy!: User;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt!: Date;
}
