import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, OneToMany, PrimaryGeneratedColumn } from 'typeorm';
import { SuiteVersion } from './suite-version';
import { User } from './user';

/** A suite's identity: its slug (the `id` inside suite files) and who created it. Its content lives in versions. */
@Entity({ name: 'suites' })
export class Suite {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'text', unique: true })
  slug!: string;

  @ManyToOne(() => User, { nullable: false, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'created_by', foreignKeyConstraintName: 'FK_suites_created_by' })
  createdBy!: User;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt!: Date;

  @OneToMany(() => SuiteVersion, (v) => v.suite)
  versions!: SuiteVersion[];
}
