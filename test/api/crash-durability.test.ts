import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { afterAll, expect, it } from 'vitest';
import type { Role } from '@shared/auth/roles';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '@server/seed/demo-accounts';
import { spawnServer, type ServerProcess } from '../support/server-process';
import { setUpWorkshop } from '../support/workshop-setup';

/** A reading the server answered for survives the server being killed the next instant. */
const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'probepath-crash-'));
let server: ServerProcess | undefined;
afterAll(async () => {
  await server?.kill('SIGKILL');
  fs.rmSync(dataDir, { recursive: true, force: true });
});

const tokenFor = (url: string) => async (role: Role) => {
  const email = DEMO_ACCOUNTS.find((a) => a.role === role)!.email;
  return (await request(url).post('/api/auth/sign-in').send({ email, password: DEMO_PASSWORD })).body.token as string;
};

it('keeps every acknowledged step after SIGKILL and a restart, and a retry after the restart does not duplicate', { timeout: 90_000 }, async () => {
  server = await spawnServer(dataDir);
  const first = server.url;
  const ids = await setUpWorkshop({ app: first, tokenFor: tokenFor(first) });
  const tech = await tokenFor(first)('tech');
  const auth = { authorization: `Bearer ${tech}` };
  const started = await request(first).post('/api/diagnoses').set(auth).send({ procedureId: ids.procedureId, jobId: ids.jobId, meterId: ids.meterId, ambientC: 20 });
  const id = started.body.diagnosis.id;
  const step = await request(first).post(`/api/diagnoses/${id}/steps`).set(auth).set('Idempotency-Key', 'crash-key-0001').send({ checkId: 'coil', reading: '0.455k' });
  expect(step.status).toBe(201);
  await server.kill('SIGKILL');

  server = await spawnServer(dataDir);
  const again = server.url;
  const detail = await request(again).get(`/api/diagnoses/${id}`).set(auth);
  expect(detail.status).toBe(200);
  expect(detail.body.diagnosis.steps).toHaveLength(1);
  expect(detail.body.diagnosis.steps[0]).toMatchObject({ readingText: '0.455k', valueSi: 455, verdict: 'in_spec' });
  expect(detail.body.diagnosis.currentCheckId).toBe('spark');

  const retry = await request(again).post(`/api/diagnoses/${id}/steps`).set(auth).set('Idempotency-Key', 'crash-key-0001').send({ checkId: 'coil', reading: '0.455k' });
  expect(retry.status).toBe(201);
  expect(retry.headers['idempotent-replayed']).toBe('true');
  expect((await request(again).get(`/api/diagnoses/${id}`).set(auth)).body.diagnosis.steps).toHaveLength(1);
});
