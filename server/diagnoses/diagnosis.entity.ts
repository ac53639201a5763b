import { Column, CreateDateColumn, Entity, Index, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { Job } from '../jobs/job.entity';
import { Machine } from '../machines/machine.entity';
import { Meter } from '../meters/meter.entity';
import { ProcedureVersion } from '../procedures/procedure-version.entity';
import { User } from '../users/user.entity';

export type DiagnosisStatus = 'open' | 'concluded' | 'abandoned';

export interface Conclusion {
  findingCheckId: string;
  note: string;
  parts: string;
  labourMinutes: number | null;
}

/** One run of a pinned procedure version on one machine for one job. */
@Entity('diagnosis')
@Index(['shopId', 'status', 'startedAt'])
export class Diagnosis {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column('text')
  shopId: string;

  @Column('text')
  versionId: string;

  @ManyToOne(() => ProcedureVersion, { onDelete: 'RESTRICT' })
  version: Relation<ProcedureVersion>;

  @Column('text')
  machineId: string;

  @ManyToOne(() => Machine, { onDelete: 'RESTRICT' })
  machine: Relation<Machine>;

  @Column('text')
  jobId: string;

  @ManyToOne(() => Job, { onDelete: 'RESTRICT' })
  job: Relation<Job>;

  @Column('text')
  meterId: string;

  @ManyToOne(() => Meter, { onDelete: 'RESTRICT' })
  meter: Relation<Meter>;

  /** Ambient temperature entered at the start, °C; copper-winding specs are corrected to it. */
  @Column('real')
  ambientC: number;

  @Column('text')
  startedById: string;

  @ManyToOne(() => User, { onDelete: 'RESTRICT' })
  startedBy: Relation<User>;

  @Column('text')
  status: DiagnosisStatus;

  /** The check waiting for a reading; a finding once the path reaches one. */
  @Column('text')
  currentCheckId: string;

  @Column('simple-json', { nullable: true })
  conclusion: Conclusion | null;

  @Column('text', { nullable: true })
  abandonReason: string | null;

  @Column('datetime')
  startedAt: Date;

  @Column('datetime', { nullable: true })
  endedAt: Date | null;
}
