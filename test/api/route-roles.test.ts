import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROLES } from '@shared/auth/roles';
import { routeTable } from '@server/route-table';
import { createHarness, type Harness } from '../support/api-harness';

/** The role × route matrix, generated from the one route table the app mounts. */
let h: Harness;
const tokens: Record<string, string> = {};
beforeAll(async () => {
  h = await createHarness({ rateLimit: { windowMs: 60_000, limit: 10_000 } });
  for (const role of ROLES) tokens[role] = await h.tokenFor(role);
});
afterAll(() => h.close());

const concrete = (path: string) => path.replace(/:(\w+)/g, '00000000-0000-4000-8000-000000000000');
const call = (method: string, path: string) =>
  (request(h.app) as unknown as Record<string, (p: string) => request.Test>)[method](concrete(path)).send({});

const protectedRoutes = routeTable.filter((r) => r.roles !== 'public');

it('covers every protected route and every role', () => {
  expect(protectedRoutes.length).toBeGreaterThanOrEqual(6);
});

describe.each(protectedRoutes.map((r) => [`${r.method.toUpperCase()} ${r.path}`, r] as const))('%s', (_name, route) => {
  it('answers 401 without a token', async () => {
    const res = await call(route.method, route.path);
    expect(res.status).toBe(401);
  });

  it.each(ROLES.map((role) => [role, (route.roles as readonly string[]).includes(role)] as const))(
    'role %s allowed=%s',
    async (role, allowed) => {
      const res = await call(route.method, route.path).set('authorization', `Bearer ${tokens[role]}`);
      if (allowed) {
        expect([401, 403]).not.toContain(res.status);
        expect(res.status).toBeLessThan(500);
      } else {
        expect(res.status).toBe(403);
        expect(res.body.error.code).toBe('forbidden');
      }
    },
  );
});
