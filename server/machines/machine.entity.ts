import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** The vehicle on the bench. */
@Entity('machine')
@Index(['shopId', 'createdAt'])
export class Machine {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column('text')
  shopId: string;

  @Column('text')
  make: string;

  @Column('text')
  model: string;

  @Column('integer')
  year: number;

  @Column('text', { default: '' })
  engine: string;

  @Column('text', { default: '' })
  vin: string;

  @Column('integer', { nullable: true })
  mileage: number | null;

  @Column('text', { default: 'km' })
  mileageUnit: string;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;
}
