import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Job } from '@server/jobs/job.entity';
import { Machine } from '@server/machines/machine.entity';
import { createHarness, type Harness } from '../support/api-harness';

let h: Harness;
let tech: string;
const as = (token: string) => ({ authorization: `Bearer ${token}` });
const post = (path: string, body: object, key: string, token = tech) => request(h.app).post(path).set(as(token)).set('Idempotency-Key', key).send(body);
const machineBody = { make: 'Ostrava', model: 'Brisk 50', year: 2016, vin: '', mileage: 8800 };

beforeAll(async () => {
  h = await createHarness();
  tech = await h.tokenFor('tech');
});
afterAll(() => h.close());

describe('POST /api/machines with an Idempotency-Key', () => {
  it('replays the first answer to a retry and records one machine', async () => {
    const before = await h.runtime.ctx.ds.getRepository(Machine).count();
    const first = await post('/api/machines', machineBody, 'machine-key-0001');
    const retry = await post('/api/machines', machineBody, 'machine-key-0001');
    expect(first.status).toBe(201);
    expect(first.headers['idempotent-replayed']).toBeUndefined();
    expect(retry.status).toBe(201);
    expect(retry.headers['idempotent-replayed']).toBe('true');
    expect(retry.body).toEqual(first.body);
    expect(await h.runtime.ctx.ds.getRepository(Machine).count()).toBe(before + 1);
  });

  it('refuses the same key with a different body (422) and records nothing', async () => {
    const before = await h.runtime.ctx.ds.getRepository(Machine).count();
    const res = await post('/api/machines', { ...machineBody, mileage: 9900 }, 'machine-key-0001');
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('idempotency_key_reused');
    expect(await h.runtime.ctx.ds.getRepository(Machine).count()).toBe(before);
  });

  it('keeps keys per member: another member with the same key records their own machine', async () => {
    const lead = await h.tokenFor('lead');
    const res = await post('/api/machines', machineBody, 'machine-key-0001', lead);
    expect(res.status).toBe(201);
    expect(res.headers['idempotent-replayed']).toBeUndefined();
  });

  it('still records one machine per call without a key', async () => {
    const before = await h.runtime.ctx.ds.getRepository(Machine).count();
    await request(h.app).post('/api/machines').set(as(tech)).send(machineBody);
    await request(h.app).post('/api/machines').set(as(tech)).send(machineBody);
    expect(await h.runtime.ctx.ds.getRepository(Machine).count()).toBe(before + 2);
  });
});

describe('POST /api/jobs with an Idempotency-Key', () => {
  let machineId: string;
  beforeAll(async () => {
    machineId = (await post('/api/machines', machineBody, 'machine-for-jobs-1')).body.machine.id;
  });

  it('replays the first answer to a retry and opens one job', async () => {
    const body = { machineId, customerName: 'Piet Lindqvist', complaint: 'Stalls at idle when hot' };
    const before = await h.runtime.ctx.ds.getRepository(Job).count();
    const first = await post('/api/jobs', body, 'job-key-00001');
    const retry = await post('/api/jobs', body, 'job-key-00001');
    expect(first.status).toBe(201);
    expect(retry.status).toBe(201);
    expect(retry.headers['idempotent-replayed']).toBe('true');
    expect(retry.body.job.id).toBe(first.body.job.id);
    expect(retry.body).toEqual(first.body);
    expect(await h.runtime.ctx.ds.getRepository(Job).count()).toBe(before + 1);
  });

  it('refuses the same key with a different body (422) and opens nothing', async () => {
    const before = await h.runtime.ctx.ds.getRepository(Job).count();
    const res = await post('/api/jobs', { machineId, customerName: 'Piet Lindqvist', complaint: 'No lights' }, 'job-key-00001');
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('idempotency_key_reused');
    expect(await h.runtime.ctx.ds.getRepository(Job).count()).toBe(before);
  });

  it('stores nothing for a refused request, so a corrected retry with the same key goes through', async () => {
    const missing = await post('/api/jobs', { machineId: '00000000-0000-4000-8000-000000000000', customerName: 'Ola Brandt', complaint: 'Weak spark' }, 'job-key-00002');
    expect(missing.status).toBe(404);
    const fixed = await post('/api/jobs', { machineId, customerName: 'Ola Brandt', complaint: 'Weak spark' }, 'job-key-00002');
    expect(fixed.status).toBe(201);
  });
});
