import { Column, CreateDateColumn, Entity, Index, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { Machine } from '../machines/machine.entity';

/** The shop's work order: customer, complaint, machine. */
@Entity('job')
@Index(['shopId', 'createdAt'])
export class Job {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column('text')
  shopId: string;

  @Column('text')
  machineId: string;

  @ManyToOne(() => Machine, { onDelete: 'RESTRICT' })
  machine: Relation<Machine>;

  @Column('text')
  customerName: string;

  @Column('text', { default: '' })
  customerContact: string;

  @Column('text', { default: '' })
  customerEmail: string;

  @Column('text')
  complaint: string;

  @Column('text', { default: '' })
  reference: string;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;
}
