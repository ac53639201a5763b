import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '@server/seed/demo-accounts';
import { createHarness, demoEmail, type Harness } from '../support/api-harness';

let h: Harness;
let owner: string;
const members = async () => (await request(h.app).get('/api/members').set('authorization', `Bearer ${owner}`)).body.members as { id: string; email: string; role: string; active: boolean }[];
const idOf = async (email: string) => (await members()).find((m) => m.email === email)!.id;

beforeAll(async () => {
  h = await createHarness();
  owner = await h.tokenFor('owner');
});
afterAll(() => h.close());

describe('members', () => {
  it('lists the four demo members of the shop and nobody from another shop', async () => {
    const list = await members();
    expect(list.map((m) => m.role).sort()).toEqual(['apprentice', 'lead', 'owner', 'tech']);
    expect(list.some((m) => m.email.endsWith('copperfield.example'))).toBe(false);
  });

  it('changes a role, and the new role applies to the next request of that member', async () => {
    const apprentice = await h.tokenFor('apprentice');
    expect((await request(h.app).get('/api/members').set('authorization', `Bearer ${apprentice}`)).status).toBe(403);
    const id = await idOf(demoEmail('apprentice'));
    const res = await request(h.app).patch(`/api/members/${id}`).set('authorization', `Bearer ${owner}`).send({ role: 'owner' });
    expect(res.status).toBe(200);
    expect(res.body.member.role).toBe('owner');
    expect((await request(h.app).get('/api/members').set('authorization', `Bearer ${apprentice}`)).status).toBe(200);
    await request(h.app).patch(`/api/members/${id}`).set('authorization', `Bearer ${owner}`).send({ role: 'apprentice' });
  });

  it('deactivation stops the member at once: their token and their password', async () => {
    const tech = await h.tokenFor('tech');
    const id = await idOf(demoEmail('tech'));
    const res = await request(h.app).patch(`/api/members/${id}`).set('authorization', `Bearer ${owner}`).send({ active: false });
    expect(res.body.member.active).toBe(false);
    const me = await request(h.app).get('/api/auth/me').set('authorization', `Bearer ${tech}`);
    expect(me.status).toBe(401);
    expect(me.body.error.code).toBe('deactivated');
    const signIn = await request(h.app).post('/api/auth/sign-in').send({ email: demoEmail('tech'), password: DEMO_PASSWORD });
    expect(signIn.status).toBe(401);
    await request(h.app).patch(`/api/members/${id}`).set('authorization', `Bearer ${owner}`).send({ active: true });
    expect((await request(h.app).get('/api/auth/me').set('authorization', `Bearer ${tech}`)).status).toBe(200);
  });

  it('keeps at least one active owner', async () => {
    const id = await idOf(demoEmail('owner'));
    const demote = await request(h.app).patch(`/api/members/${id}`).set('authorization', `Bearer ${owner}`).send({ role: 'tech' });
    expect(demote.status).toBe(409);
    expect(demote.body.error.code).toBe('last_owner');
    const deactivate = await request(h.app).patch(`/api/members/${id}`).set('authorization', `Bearer ${owner}`).send({ active: false });
    expect(deactivate.status).toBe(409);
    expect((await members()).find((m) => m.id === id)).toMatchObject({ role: 'owner', active: true });
  });
});
