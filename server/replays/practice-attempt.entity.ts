import { Column, Entity, Index, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import type { PracticeAsk } from '@shared/practice/schemas';
import { Diagnosis } from '../diagnoses/diagnosis.entity';
import { User } from '../users/user.entity';

/**
 * One answer given in practice mode, scored by the server against the recorded step. A question is answered
 * once per practice pass (`runId`), so a pass cannot be fished for the right answer.
 */
@Entity('practice_attempt')
@Index(['userId', 'runId', 'stepSeq', 'asked'], { unique: true })
@Index(['shopId', 'createdAt'])
export class PracticeAttempt {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column('text')
  shopId: string;

  @Column('text')
  userId: string;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  user: Relation<User>;

  @Column('text')
  runId: string;

  @Column('text')
  diagnosisId: string;

  @ManyToOne(() => Diagnosis, { onDelete: 'CASCADE' })
  diagnosis: Relation<Diagnosis>;

  @Column('integer')
  stepSeq: number;

  @Column('text')
  checkId: string;

  @Column('text')
  asked: PracticeAsk;

  @Column('text')
  answer: string;

  /** The recorded answer it was scored against: a verdict key or a check id. */
  @Column('text')
  expected: string;

  @Column('boolean')
  correct: boolean;

  @Column('datetime')
  createdAt: Date;
}
