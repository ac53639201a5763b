import { Column, Entity, Index, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { Diagnosis } from '../diagnoses/diagnosis.entity';
import { User } from '../users/user.entity';

/** A lead's remark on one step of a concluded diagnosis, shown to everyone who replays it. */
@Entity('step_comment')
@Index(['diagnosisId', 'stepSeq'])
export class StepComment {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column('text')
  shopId: string;

  @Column('text')
  diagnosisId: string;

  @ManyToOne(() => Diagnosis, { onDelete: 'CASCADE' })
  diagnosis: Relation<Diagnosis>;

  /** The step's `seq` within its diagnosis (retracted steps may be commented on too). */
  @Column('integer')
  stepSeq: number;

  @Column('text')
  authorId: string;

  @ManyToOne(() => User, { onDelete: 'RESTRICT' })
  author: Relation<User>;

  @Column('text')
  body: string;

  @Column('datetime')
  createdAt: Date;
}
