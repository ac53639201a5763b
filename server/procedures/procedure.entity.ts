import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** An authored check sequence for one complaint on a family of machines; its content lives in versions. */
@Entity('procedure')
@Index(['shopId', 'title'])
export class Procedure {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column('text')
  shopId: string;

  @Column('text')
  title: string;

  /** The complaint it diagnoses, in the trade's words ("cranks but no spark"). */
  @Column('text')
  complaint: string;

  /** Machines it applies to ("Veltro 650 twins, 2016–2021"). */
  @Column('text')
  family: string;

  @Column('text')
  createdById: string;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;
}
