import { Column, Entity, Index, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, type Relation } from 'typeorm';
import type { ProcedureDocument } from '@shared/engine/procedure';
import { Procedure } from './procedure.entity';

export type VersionStatus = 'draft' | 'published' | 'retired';

/**
 * One version of a procedure. A draft is editable and carries a revision for
 * optimistic concurrency; a published version is numbered and never changes;
 * a retired one stays readable but cannot be started.
 */
@Entity('procedure_version')
@Index(['procedureId', 'number'], { unique: true })
@Index(['shopId', 'status'])
export class ProcedureVersion {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column('text')
  shopId: string;

  @Column('text')
  procedureId: string;

  @ManyToOne(() => Procedure, { onDelete: 'CASCADE' })
  procedure: Relation<Procedure>;

  @Column('text')
  status: VersionStatus;

  /** 1, 2, 3… once published; null while a draft. */
  @Column('integer', { nullable: true })
  number: number | null;

  /** Increases with every saved edit of a draft. */
  @Column('integer', { default: 1 })
  revision: number;

  @Column('simple-json')
  document: ProcedureDocument;

  @Column('text')
  updatedById: string;

  @Column('datetime', { nullable: true })
  publishedAt: Date | null;

  @Column('text', { nullable: true })
  publishedById: string | null;

  /** What changed, written by the lead who published the version. */
  @Column('text', { nullable: true })
  note: string | null;

  @Column('datetime', { nullable: true })
  retiredAt: Date | null;

  @UpdateDateColumn({ type: 'datetime' })
  updatedAt: Date;
}
