import { Column, CreateDateColumn, Entity, Index, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import type { Role } from '@shared/auth/roles';
import { Shop } from '../shops/shop.entity';
import { User } from '../users/user.entity';

@Entity('invite')
export class Invite {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column('text')
  shopId: string;

  @ManyToOne(() => Shop, { onDelete: 'CASCADE' })
  shop: Relation<Shop>;

  @Column('text')
  email: string;

  @Column('text')
  role: Role;

  /** SHA-256 of the token in the link; the token itself is never stored. */
  @Index({ unique: true })
  @Column('text')
  tokenHash: string;

  @Column('text')
  invitedById: string;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  invitedBy: Relation<User>;

  @Column('datetime')
  expiresAt: Date;

  @Column('datetime', { nullable: true })
  acceptedAt: Date | null;

  @Column('datetime', { nullable: true })
  revokedAt: Date | null;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;
}
