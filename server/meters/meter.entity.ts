import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';
import type { MeterRange } from '@shared/workshop/schemas';

/** A meter of the shop with its published accuracy per function and range. */
@Entity('meter')
export class Meter {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column('text')
  shopId: string;

  @Column('text')
  name: string;

  @Column('text', { default: '' })
  model: string;

  @Column('simple-json')
  ranges: MeterRange[];

  @Column('boolean', { default: true })
  active: boolean;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;
}
