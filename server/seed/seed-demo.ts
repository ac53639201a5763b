import type { DataSource } from 'typeorm';
import type { Role } from '@shared/auth/roles';
import { hashPassword } from '../auth/passwords';
import { Shop } from '../shops/shop.entity';
import { User } from '../users/user.entity';
import { DEMO_ACCOUNTS, DEMO_PASSWORD, DEMO_SHOP } from './demo-accounts';
import { seedDemoWorkshop } from './demo-workshop';

/**
 * Seeds the demo shop on first start only: a database with any shop is left alone.
 * API tests take the accounts without the workshop content, so their counts are their own. With `dataDir`
 * a few seeded diagnoses get a step photo, written under it like an uploaded one.
 */
export async function seedDemo(ds: DataSource, options: { workshop?: boolean; dataDir?: string } = {}): Promise<boolean> {
  if ((await ds.getRepository(Shop).count()) > 0) return false;
  await ds.transaction(async (tx) => {
    const shop = await tx.getRepository(Shop).save({ name: DEMO_SHOP });
    const users = {} as Record<Role, User>;
    for (const a of DEMO_ACCOUNTS) {
      users[a.role] = await tx.getRepository(User).save({ shopId: shop.id, email: a.email, name: a.name, role: a.role, active: true, passwordHash: await hashPassword(DEMO_PASSWORD) });
    }
    if (options.workshop !== false) await seedDemoWorkshop(tx, shop, users, { dataDir: options.dataDir });
  });
  return true;
}
