import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createHarness, demoEmail, type Harness } from '../support/api-harness';

/** A member of a second shop must never read or change the first shop's records: always 404. */
let h: Harness;
let owner: string;
let intruder: string;
let memberId: string;
let inviteId: string;
let mailId: string;

beforeAll(async () => {
  h = await createHarness();
  owner = await h.tokenFor('owner');
  intruder = await h.otherShopToken();
  const list = await request(h.app).get('/api/members').set('authorization', `Bearer ${owner}`);
  memberId = list.body.members.find((m: { email: string }) => m.email === demoEmail('tech')).id;
  const invite = await request(h.app).post('/api/invites').set('authorization', `Bearer ${owner}`).send({ email: 'kit@harrowlane.example', role: 'tech' });
  inviteId = invite.body.invite.id;
  mailId = (await request(h.app).get('/api/mail').set('authorization', `Bearer ${owner}`)).body.messages[0].id;
});
afterAll(() => h.close());

describe('shop isolation', () => {
  it("cannot change another shop's member", async () => {
    const res = await request(h.app).patch(`/api/members/${memberId}`).set('authorization', `Bearer ${intruder}`).send({ active: false });
    expect(res.status).toBe(404);
    const list = await request(h.app).get('/api/members').set('authorization', `Bearer ${owner}`);
    expect(list.body.members.find((m: { id: string }) => m.id === memberId).active).toBe(true);
  });

  it("cannot revoke another shop's invite", async () => {
    expect((await request(h.app).delete(`/api/invites/${inviteId}`).set('authorization', `Bearer ${intruder}`)).status).toBe(404);
    const pending = await request(h.app).get('/api/invites').set('authorization', `Bearer ${owner}`);
    expect(pending.body.invites.map((i: { id: string }) => i.id)).toContain(inviteId);
  });

  it("cannot read another shop's mail, and its own lists hold none of it", async () => {
    expect((await request(h.app).get(`/api/mail/${mailId}`).set('authorization', `Bearer ${intruder}`)).status).toBe(404);
    const own = await request(h.app).get('/api/mail').set('authorization', `Bearer ${intruder}`);
    expect(own.body.messages).toEqual([]);
    const members = await request(h.app).get('/api/members').set('authorization', `Bearer ${intruder}`);
    expect(members.body.members.map((m: { email: string }) => m.email)).toEqual(['wren@copperfield.example']);
    const invites = await request(h.app).get('/api/invites').set('authorization', `Bearer ${intruder}`);
    expect(invites.body.invites).toEqual([]);
  });

  it('ignores a shop id smuggled in the body', async () => {
    const res = await request(h.app).post('/api/invites').set('authorization', `Bearer ${intruder}`).send({ email: 'x@copperfield.example', role: 'tech', shopId: 'anything' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('unknown_field');
  });
});
