import 'reflect-metadata';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import type { Role } from '@shared/auth/roles';
import { createApp, type AppOptions } from '@server/app';
import { readConfig } from '@server/config';
import { createRuntime, type Runtime } from '@server/context';
import { openDatabase } from '@server/db/data-source';
import { hashPassword } from '@server/auth/passwords';
import { MailMessage } from '@server/mail/mail-message.entity';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '@server/seed/demo-accounts';
import { seedDemo } from '@server/seed/seed-demo';
import { Shop } from '@server/shops/shop.entity';
import { User } from '@server/users/user.entity';

export const OTHER_SHOP_OWNER = { email: 'wren@copperfield.example', name: 'Wren Adeyemi', password: 'other-shop-pass-1' };

export interface Harness {
  app: ReturnType<typeof createApp>;
  runtime: Runtime;
  dataDir: string;
  /** Signs in one of the demo shop's accounts and returns its bearer token. */
  tokenFor(role: Role): Promise<string>;
  /** Bearer token of the owner of a second, unrelated shop. */
  otherShopToken(): Promise<string>;
  /** Messages the local mail fake captured for an address, newest first. */
  mailTo(address: string): Promise<MailMessage[]>;
  close(): Promise<void>;
}

/**
 * A fresh database, mail fake and app per test file: the demo shop's accounts
 * (and, with `demoWorkshop`, its procedures, meters and diagnoses) plus a second shop.
 */
export async function createHarness(options: AppOptions & { demoWorkshop?: boolean } = {}): Promise<Harness> {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'probepath-api-'));
  const config = readConfig({ DATA_DIR: dataDir, LOG_LEVEL: 'silent', JWT_SECRET: 'test-secret-'.padEnd(48, 'x'), PUBLIC_URL: 'http://probepath.test' });
  const ds = await openDatabase(path.join(dataDir, 'test.sqlite'));
  const runtime = await createRuntime(config, ds);
  await seedDemo(ds, { workshop: options.demoWorkshop === true, dataDir });
  const other = await ds.getRepository(Shop).save({ name: 'Copperfield Small Engines' });
  await ds.getRepository(User).save({
    shopId: other.id,
    email: OTHER_SHOP_OWNER.email,
    name: OTHER_SHOP_OWNER.name,
    role: 'owner',
    active: true,
    passwordHash: await hashPassword(OTHER_SHOP_OWNER.password),
  });
  const app = createApp(runtime.ctx, options);
  const tokens = new Map<string, string>();
  const signIn = async (email: string, password: string) => {
    const cached = tokens.get(email);
    if (cached) return cached;
    const res = await request(app).post('/api/auth/sign-in').send({ email, password });
    if (res.status !== 200) throw new Error(`sign-in of ${email} failed: ${res.status} ${JSON.stringify(res.body)}`);
    tokens.set(email, res.body.token);
    return res.body.token as string;
  };
  return {
    app,
    runtime,
    dataDir,
    tokenFor: (role) => signIn(DEMO_ACCOUNTS.find((a) => a.role === role)!.email, DEMO_PASSWORD),
    otherShopToken: () => signIn(OTHER_SHOP_OWNER.email, OTHER_SHOP_OWNER.password),
    mailTo: (address) => ds.getRepository(MailMessage).find({ where: { toAddress: address }, order: { createdAt: 'DESC' } }),
    async close() {
      await runtime.close();
      fs.rmSync(dataDir, { recursive: true, force: true });
    },
  };
}

export const demoEmail = (role: Role) => DEMO_ACCOUNTS.find((a) => a.role === role)!.email;

/** The token in the first link of a captured message, e.g. …/invite?token=abc. */
export function linkToken(message: MailMessage, route: string): string {
  const match = new RegExp(`https?://\\S+/${route}\\?token=([A-Za-z0-9_-]+)`).exec(message.text);
  if (!match) throw new Error(`no ${route} link in: ${message.text}`);
  return match[1];
}
