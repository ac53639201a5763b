import type { Member, SessionUser } from '@shared/api/types';
import type { User } from './user.entity';

export const toSessionUser = (u: User & { shop: { name: string } }): SessionUser => ({
  id: u.id,
  email: u.email,
  name: u.name,
  role: u.role,
  shopId: u.shopId,
  shopName: u.shop.name,
});

export const toMember = (u: User): Member => ({
  id: u.id,
  email: u.email,
  name: u.name,
  role: u.role,
  active: u.active,
  createdAt: u.createdAt.toISOString(),
});
