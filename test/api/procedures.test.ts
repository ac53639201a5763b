import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ProcedureVersion } from '@server/procedures/procedure-version.entity';
import { createHarness, type Harness } from '../support/api-harness';
import { fixtureProcedure } from '../support/fixture-procedure';

let h: Harness;
let lead: string;
let procedureId: string;
const as = (token: string) => ({ authorization: `Bearer ${token}` });

beforeAll(async () => {
  h = await createHarness();
  lead = await h.tokenFor('lead');
  const created = await request(h.app).post('/api/procedures').set(as(lead)).send({ title: 'No spark, pulse-coil twin', complaint: 'Cranks but no spark', family: 'Test twins' });
  expect(created.status).toBe(201);
  procedureId = created.body.procedure.id;
});
afterAll(() => h.close());

describe('drafts', () => {
  it('starts as revision 1 and saves with the revision it was read at', async () => {
    const draft = await request(h.app).get(`/api/procedures/${procedureId}/draft`).set(as(lead));
    expect(draft.body.draft.revision).toBe(1);
    const saved = await request(h.app).put(`/api/procedures/${procedureId}/draft`).set(as(lead)).send({ revision: 1, document: fixtureProcedure() });
    expect(saved.status).toBe(200);
    expect(saved.body).toEqual({ revision: 2, problems: [] });
  });

  it('answers 409 to a stale save and overwrites nothing', async () => {
    const stale = fixtureProcedure();
    stale.checks[0].title = 'Overwritten by a stale save';
    const res = await request(h.app).put(`/api/procedures/${procedureId}/draft`).set(as(lead)).send({ revision: 1, document: stale });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('stale_revision');
    const draft = await request(h.app).get(`/api/procedures/${procedureId}/draft`).set(as(lead));
    expect(draft.body.draft.revision).toBe(2);
    expect(draft.body.draft.document.checks[0].title).toBe('Pickup coil resistance');
  });

  it('refuses a document that is not a procedure, with what is wrong', async () => {
    const res = await request(h.app).put(`/api/procedures/${procedureId}/draft`).set(as(lead)).send({ revision: 2, document: { checks: 'none' } });
    expect(res.status).toBe(400);
    expect(res.body.error.message.length).toBeGreaterThan(10);
    expect((await request(h.app).get(`/api/procedures/${procedureId}/draft`).set(as(lead))).body.draft.revision).toBe(2);
  });
});

describe('publishing', () => {
  it('refuses to publish an invalid graph and lists its problems by check', async () => {
    const broken = fixtureProcedure();
    const spark = broken.checks.find((c) => c.id === 'spark')!;
    if (spark.kind === 'observe') spark.choices[1].next = 'nowhere';
    const saved = await request(h.app).put(`/api/procedures/${procedureId}/draft`).set(as(lead)).send({ revision: 2, document: broken });
    expect(saved.body.problems.length).toBeGreaterThan(0);
    const res = await request(h.app).post(`/api/procedures/${procedureId}/draft/publish`).set(as(lead)).send({ revision: 3 });
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('invalid_procedure');
    expect(res.body.error.problems.some((p: { checkId: string }) => p.checkId === 'spark')).toBe(true);
    const detail = await request(h.app).get(`/api/procedures/${procedureId}`).set(as(lead));
    expect(detail.body.procedure.latestPublished).toBeNull();
  });

  it('refuses to publish a stale revision', async () => {
    await request(h.app).put(`/api/procedures/${procedureId}/draft`).set(as(lead)).send({ revision: 3, document: fixtureProcedure() });
    const res = await request(h.app).post(`/api/procedures/${procedureId}/draft/publish`).set(as(lead)).send({ revision: 3 });
    expect(res.status).toBe(409);
  });

  it('publishes a valid draft as version 1, which then never changes', async () => {
    const res = await request(h.app).post(`/api/procedures/${procedureId}/draft/publish`).set(as(lead)).send({ revision: 4 });
    expect(res.status).toBe(200);
    expect(res.body.version).toBe(1);
    expect((await request(h.app).get(`/api/procedures/${procedureId}/draft`).set(as(lead))).status).toBe(404);

    const put = await request(h.app).put(`/api/procedures/${procedureId}/versions/1`).set(as(lead)).send({});
    expect(put.status).toBe(409);
    expect(put.body.error.code).toBe('version_immutable');

    // Even code that bypasses the API cannot change it: the database refuses.
    const repo = h.runtime.ctx.ds.getRepository(ProcedureVersion);
    const v1 = await repo.findOneByOrFail({ procedureId, number: 1 });
    await expect(repo.update({ id: v1.id }, { document: { ...v1.document, startCheckId: 'ok' } })).rejects.toThrow(/immutable/);
    expect((await repo.findOneByOrFail({ id: v1.id })).document.startCheckId).toBe('coil');
  });

  it('numbers the next published draft 2 and retires 1 on request', async () => {
    const draft = await request(h.app).post(`/api/procedures/${procedureId}/draft`).set(as(lead)).send({ fromVersion: 1 });
    expect(draft.status).toBe(201);
    expect((await request(h.app).post(`/api/procedures/${procedureId}/draft`).set(as(lead)).send({ fromVersion: 1 })).status).toBe(409);
    const published = await request(h.app).post(`/api/procedures/${procedureId}/draft/publish`).set(as(lead)).send({ revision: 1 });
    expect(published.body.version).toBe(2);
    const retired = await request(h.app).post(`/api/procedures/${procedureId}/versions/1/retire`).set(as(lead)).send({});
    expect(retired.status).toBe(200);
    const detail = await request(h.app).get(`/api/procedures/${procedureId}`).set(as(lead));
    expect(detail.body.procedure.versions.map((v: { number: number; status: string }) => [v.number, v.status])).toEqual([
      [2, 'published'],
      [1, 'retired'],
    ]);
    const v1 = await request(h.app).get(`/api/procedures/${procedureId}/versions/1`).set(as(lead));
    expect(v1.body.version.document.startCheckId).toBe('coil');
  });

  it('shows technicians published procedures only, and never drafts', async () => {
    const other = await request(h.app).post('/api/procedures').set(as(lead)).send({ title: 'Draft only', complaint: 'x', family: 'y' });
    const tech = await h.tokenFor('tech');
    const list = await request(h.app).get('/api/procedures').set(as(tech));
    const ids = list.body.procedures.map((p: { id: string }) => p.id);
    expect(ids).toContain(procedureId);
    expect(ids).not.toContain(other.body.procedure.id);
    expect((await request(h.app).get(`/api/procedures/${other.body.procedure.id}`).set(as(tech))).status).toBe(404);
    expect((await request(h.app).get(`/api/procedures/${procedureId}/draft`).set(as(tech))).status).toBe(403);
  });

  it("hides one shop's procedures from another", async () => {
    const intruder = await h.otherShopToken();
    expect((await request(h.app).get(`/api/procedures/${procedureId}`).set(as(intruder))).status).toBe(404);
    expect((await request(h.app).post(`/api/procedures/${procedureId}/versions/2/retire`).set(as(intruder)).send({})).status).toBe(404);
    const list = await request(h.app).get('/api/procedures').set(as(intruder));
    expect(list.body.procedures).toEqual([]);
  });
});
