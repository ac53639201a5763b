import type { DataSource } from 'typeorm';
import { hashPassword } from '../auth/passwords';
import { Shop } from '../shops/shop.entity';
import { User } from '../users/user.entity';
import { DEMO_ACCOUNTS, DEMO_PASSWORD, DEMO_SHOP } from './demo-accounts';

/** Seeds the demo shop on first start only: a database with any shop is left alone. */
export async function seedDemo(ds: DataSource): Promise<boolean> {
  if ((await ds.getRepository(Shop).count()) > 0) return false;
  await ds.transaction(async (tx) => {
    const shop = await tx.getRepository(Shop).save({ name: DEMO_SHOP });
    for (const a of DEMO_ACCOUNTS) {
      await tx.getRepository(User).save({ shopId: shop.id, email: a.email, name: a.name, role: a.role, active: true, passwordHash: await hashPassword(DEMO_PASSWORD) });
    }
  });
  return true;
}
