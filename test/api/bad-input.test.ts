import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Invite } from '@server/invites/invite.entity';
import { User } from '@server/users/user.entity';
import { createHarness, type Harness } from '../support/api-harness';

/** Bad input gets a clear 4xx, never a 5xx, and writes nothing. */
let h: Harness;
let owner: string;
let counts: () => Promise<[number, number]>;
beforeAll(async () => {
  h = await createHarness({ rateLimit: { windowMs: 60_000, limit: 10_000 } });
  owner = await h.tokenFor('owner');
  counts = async () => [await h.runtime.ctx.ds.getRepository(User).count(), await h.runtime.ctx.ds.getRepository(Invite).count()];
});
afterAll(() => h.close());

const invite = () => request(h.app).post('/api/invites').set('authorization', `Bearer ${owner}`);

const cases: [string, () => request.Test, number, string][] = [
  ['malformed JSON', () => invite().set('content-type', 'application/json').send('{"email": "a@b.example",'), 400, 'malformed_json'],
  ['a JSON array', () => invite().send([{ email: 'a@b.example', role: 'tech' }]), 400, 'invalid_input'],
  ['a bare JSON string', () => invite().set('content-type', 'application/json').send('"hello"'), 400, 'malformed_json'],
  ['a missing field', () => invite().send({ email: 'a@b.example' }), 400, 'invalid_input'],
  ['an extra field', () => invite().send({ email: 'a@b.example', role: 'tech', admin: true }), 400, 'unknown_field'],
  ['a wrong type', () => invite().send({ email: { $ne: null }, role: 'tech' }), 400, 'invalid_input'],
  ['an unknown role', () => invite().send({ email: 'a@b.example', role: 'superuser' }), 400, 'invalid_input'],
  ['a very long string', () => invite().send({ email: `${'a'.repeat(5000)}@b.example`, role: 'tech' }), 400, 'invalid_input'],
  ['an oversized body', () => invite().send({ email: 'a@b.example', role: 'tech', pad: 'x'.repeat(300 * 1024) }), 413, 'too_large'],
  ['an address with no domain', () => invite().send({ email: 'ünïcødé', role: 'tech' }), 400, 'invalid_input'],
  ['a null role', () => invite().send({ email: 'a@b.example', role: null }), 400, 'invalid_input'],
  ['a boolean sent as a string to members', () => request(h.app).patch('/api/members/00000000-0000-4000-8000-000000000000').set('authorization', `Bearer ${owner}`).send({ active: 'no' }), 400, 'invalid_input'],
  ['an empty change', () => request(h.app).patch('/api/members/00000000-0000-4000-8000-000000000000').set('authorization', `Bearer ${owner}`).send({}), 400, 'invalid_input'],
  ['a sign-in with a numeric password', () => request(h.app).post('/api/auth/sign-in').send({ email: 'a@b.example', password: ['x'] }), 400, 'invalid_input'],
];

describe.each(cases)('%s', (_name, send, status, code) => {
  it(`answers ${status} ${code}, with a message, and writes nothing`, async () => {
    const before = await counts();
    const res = await send();
    expect(res.status).toBe(status);
    expect(res.body.error.code).toBe(code);
    expect(res.body.error.message.length).toBeGreaterThan(10);
    expect(await counts()).toEqual(before);
  });
});

it('names each invalid field', async () => {
  const res = await invite().send({ email: 'not-an-address', role: 'boss' });
  expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'role']);
  expect(res.body.error.fields.email).toMatch(/e-mail/);
});

it('accepts unicode in names without mangling it', async () => {
  const created = await invite().send({ email: 'zoë@harrowlane.example', role: 'tech' });
  // yup's e-mail rule refuses non-ASCII local parts: a clear 400 rather than a mangled address.
  expect([201, 400]).toContain(created.status);
  if (created.status === 400) expect(created.body.error.fields.email).toBeDefined();
});

it('answers unknown API paths with a JSON 404', async () => {
  const res = await request(h.app).get('/api/no-such-thing');
  expect(res.status).toBe(404);
  expect(res.body.error.code).toBe('not_found');
});
