import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/**
 * The answer given to a write carrying an Idempotency-Key, stored in the same
 * transaction as the write, so a retry gets the same answer and never writes twice.
 */
@Entity('idempotency_record')
@Index(['shopId', 'userId', 'key'], { unique: true })
export class IdempotencyRecord {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column('text')
  shopId: string;

  @Column('text')
  userId: string;

  @Column('text')
  key: string;

  /** Method and path the key was used on, plus a hash of the body: a reuse with anything else is refused. */
  @Column('text')
  fingerprint: string;

  @Column('integer')
  status: number;

  @Column('simple-json')
  body: unknown;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;
}
