import { Column, CreateDateColumn, Entity, Index, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import type { Role } from '@shared/auth/roles';
import { Shop } from '../shops/shop.entity';

@Entity('user')
export class User {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column('text')
  shopId: string;

  @ManyToOne(() => Shop, { onDelete: 'CASCADE' })
  shop: Relation<Shop>;

  /** Unique across all shops: one e-mail signs in to one shop. */
  @Index({ unique: true })
  @Column('text')
  email: string;

  @Column('text')
  name: string;

  @Column('text')
  role: Role;

  @Column('boolean', { default: true })
  active: boolean;

  @Column('text')
  passwordHash: string;

  /**
   * Session tokens carry the epoch they were issued in; raising it (a password reset, "sign out
   * everywhere") ends every session issued before.
   */
  @Column('integer', { default: 0 })
  sessionEpoch: number;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;
}
