import request from 'supertest';
import { afterAll, beforeAll, expect, it } from 'vitest';
import { routeTable } from '@server/route-table';
import { createHarness, type Harness } from '../support/api-harness';

let h: Harness;
beforeAll(async () => {
  h = await createHarness();
});
afterAll(() => h.close());

it('documents every route of the route table with its roles and body schema', async () => {
  const res = await request(h.app).get('/api/openapi.json');
  expect(res.status).toBe(200);
  expect(res.body.openapi).toBe('3.1.0');
  for (const r of routeTable) {
    const op = res.body.paths[r.path.replace(/:(\w+)/g, '{$1}')]?.[r.method];
    expect(op, `${r.method} ${r.path}`).toBeDefined();
    expect(op['x-roles']).toEqual(r.roles);
    if (r.body) expect(op.requestBody.content['application/json'].schema.type).toBe('object');
  }
  const signIn = res.body.paths['/api/auth/sign-in'].post.requestBody.content['application/json'].schema;
  expect(signIn.required).toEqual(expect.arrayContaining(['email', 'password']));
  expect(signIn.properties.email.format).toBe('email');
});
