import { Column, CreateDateColumn, Entity, Index, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { Diagnosis } from '../diagnoses/diagnosis.entity';
import { User } from '../users/user.entity';

/**
 * A photo taken during a diagnosis, of one step or of the diagnosis as a whole.
 * The bytes live under <DATA_DIR>/photos/<shopId>/<storageKey>; the key is
 * random, never the name the file had on the phone.
 */
@Entity('diagnosis_photo')
@Index(['diagnosisId', 'createdAt'])
export class DiagnosisPhoto {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column('text')
  shopId: string;

  @Column('text')
  diagnosisId: string;

  @ManyToOne(() => Diagnosis, { onDelete: 'CASCADE' })
  diagnosis: Relation<Diagnosis>;

  /** The step the photo belongs to; null for a photo of the diagnosis as a whole. */
  @Column('text', { nullable: true })
  stepId: string | null;

  @Column('text')
  storageKey: string;

  /** image/jpeg, image/png or image/webp, as sniffed from the bytes. */
  @Column('text')
  contentType: string;

  @Column('integer')
  size: number;

  @Column('text')
  uploadedById: string;

  @ManyToOne(() => User, { onDelete: 'RESTRICT' })
  uploadedBy: Relation<User>;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;
}
