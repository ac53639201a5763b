import { Column, Entity, Index, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import type { Evaluation } from '@shared/engine/evaluate';
import type { Verdict } from '@shared/engine/verdict';
import { User } from '../users/user.entity';
import { Diagnosis } from './diagnosis.entity';

/**
 * One visited check of a diagnosis. The reading is kept exactly as typed beside
 * its parsed SI value. Going back never deletes a step: it is marked retracted.
 */
@Entity('diagnosis_step')
@Index(['diagnosisId', 'seq'], { unique: true })
export class DiagnosisStep {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column('text')
  shopId: string;

  @Column('text')
  diagnosisId: string;

  @ManyToOne(() => Diagnosis, { onDelete: 'CASCADE' })
  diagnosis: Relation<Diagnosis>;

  /** 1, 2, 3… in the order the steps were recorded, retracted ones included. */
  @Column('integer')
  seq: number;

  @Column('text')
  checkId: string;

  /** Exactly what the technician typed; null for observations and tasks. */
  @Column('text', { nullable: true })
  readingText: string | null;

  @Column('real', { nullable: true })
  valueSi: number | null;

  @Column('boolean', { default: false })
  overRange: boolean;

  @Column('text', { nullable: true })
  verdict: Verdict | null;

  /** The observation picked, for observe checks. */
  @Column('text', { nullable: true })
  choiceId: string | null;

  /** The evaluation as computed on the server (limits, uncertainty, explanation). */
  @Column('simple-json', { nullable: true })
  evaluation: Evaluation | null;

  @Column('text', { nullable: true })
  nextCheckId: string | null;

  @Column('text', { default: '' })
  note: string;

  @Column('text')
  byId: string;

  @ManyToOne(() => User, { onDelete: 'RESTRICT' })
  by: Relation<User>;

  @Column('datetime')
  recordedAt: Date;

  @Column('boolean', { default: false })
  retracted: boolean;

  @Column('datetime', { nullable: true })
  retractedAt: Date | null;

  @Column('text', { nullable: true })
  idempotencyKey: string | null;
}
