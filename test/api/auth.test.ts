import jwt from 'jsonwebtoken';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { User } from '@server/users/user.entity';
import { DEMO_PASSWORD } from '@server/seed/demo-accounts';
import { createHarness, demoEmail, type Harness } from '../support/api-harness';

let h: Harness;
beforeAll(async () => {
  h = await createHarness();
});
afterAll(() => h.close());

describe('sign-in', () => {
  it('returns a session token and the member with shop for correct credentials', async () => {
    const res = await request(h.app).post('/api/auth/sign-in').send({ email: 'Dario@HarrowLane.example ', password: DEMO_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ email: 'dario@harrowlane.example', role: 'lead', shopName: 'Harrow Lane Motor Works' });
    expect(new Date(res.body.expiresAt).getTime()).toBeGreaterThan(Date.now());
    const me = await request(h.app).get('/api/auth/me').set('authorization', `Bearer ${res.body.token}`);
    expect(me.status).toBe(200);
    expect(me.body.user.role).toBe('lead');
  });

  it('refuses a wrong password and an unknown address with the same answer', async () => {
    const wrong = await request(h.app).post('/api/auth/sign-in').send({ email: demoEmail('tech'), password: 'not-the-password' });
    const unknown = await request(h.app).post('/api/auth/sign-in').send({ email: 'nobody@harrowlane.example', password: 'not-the-password' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body.error.code).toBe('wrong_credentials');
    expect(unknown.body).toEqual(wrong.body);
    expect(wrong.body).not.toHaveProperty('token');
  });

  it('stores passwords as bcrypt hashes of cost 10 or more', async () => {
    const user = await h.runtime.ctx.ds.getRepository(User).findOneByOrFail({ email: demoEmail('owner') });
    const match = /^\$2[aby]\$(\d\d)\$/.exec(user.passwordHash);
    expect(match).not.toBeNull();
    expect(Number(match![1])).toBeGreaterThanOrEqual(10);
  });
});

describe('session tokens', () => {
  const me = (token: string) => request(h.app).get('/api/auth/me').set('authorization', `Bearer ${token}`);

  it('refuses no token, a malformed header and garbage', async () => {
    expect((await request(h.app).get('/api/auth/me')).status).toBe(401);
    expect((await request(h.app).get('/api/auth/me').set('authorization', 'Basic abc')).status).toBe(401);
    expect((await me('not-a-jwt-at-all')).status).toBe(401);
  });

  it('refuses an expired token', async () => {
    const valid = await h.tokenFor('tech');
    const claims = jwt.decode(valid) as { sub: string; shop: string };
    const expired = jwt.sign({ shop: claims.shop, exp: Math.floor(Date.now() / 1000) - 60 }, h.runtime.ctx.jwtKey, { subject: claims.sub });
    const res = await me(expired);
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('invalid_token');
  });

  it('refuses a token whose payload was changed or that was signed with another key or no key', async () => {
    const valid = await h.tokenFor('apprentice');
    const [head, , sig] = valid.split('.');
    const owner = jwt.decode(await h.tokenFor('owner')) as { sub: string; shop: string };
    const forgedPayload = Buffer.from(JSON.stringify({ shop: owner.shop, sub: owner.sub, exp: 9999999999 })).toString('base64url');
    expect((await me(`${head}.${forgedPayload}.${sig}`)).status).toBe(401);
    expect((await me(jwt.sign({ shop: owner.shop }, 'another-secret-another-secret-xx', { subject: owner.sub }))).status).toBe(401);
    const none = `${Buffer.from('{"alg":"none","typ":"JWT"}').toString('base64url')}.${forgedPayload}.`;
    expect((await me(none)).status).toBe(401);
  });

  it('refuses a token whose shop claim does not match the member', async () => {
    const claims = jwt.decode(await h.tokenFor('lead')) as { sub: string };
    const other = jwt.decode(await h.otherShopToken()) as { shop: string };
    const crossed = jwt.sign({ shop: other.shop }, h.runtime.ctx.jwtKey, { subject: claims.sub, expiresIn: '1h' });
    expect((await me(crossed)).status).toBe(401);
  });
});

describe('rate limit', () => {
  it('answers 429 after ten failed sign-ins for one address, and still lets others in', async () => {
    const email = demoEmail('apprentice');
    const statuses: number[] = [];
    for (let i = 0; i < 11; i++) {
      statuses.push((await request(h.app).post('/api/auth/sign-in').send({ email, password: `wrong-${i}-password` })).status);
    }
    expect(statuses.slice(0, 10).every((s) => s === 401)).toBe(true);
    expect(statuses[10]).toBe(429);
    const blocked = await request(h.app).post('/api/auth/sign-in').send({ email, password: DEMO_PASSWORD });
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.code).toBe('rate_limited');
    const other = await request(h.app).post('/api/auth/sign-in').send({ email: demoEmail('lead'), password: DEMO_PASSWORD });
    expect(other.status).toBe(200);
  });
});
