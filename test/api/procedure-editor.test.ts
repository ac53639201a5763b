import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { procedureFile } from '@shared/procedures/exchange-format';
import { createHarness, type Harness } from '../support/api-harness';
import { fixtureProcedure } from '../support/fixture-procedure';

let h: Harness;
let lead: string;
const as = (token: string) => ({ authorization: `Bearer ${token}` });
const meta = { title: 'Imported no-spark', complaint: 'Cranks but no spark', family: 'Test twins' };

beforeAll(async () => {
  h = await createHarness({ demoWorkshop: true });
  lead = await h.tokenFor('lead');
});
afterAll(() => h.close());

describe('procedure list', () => {
  it('shows latest version, last edit and times run', async () => {
    const res = await request(h.app).get('/api/procedures').set(as(lead));
    expect(res.status).toBe(200);
    const list = res.body.procedures as { timesRun: number; lastEditedBy: string | null; latestVersion: unknown }[];
    expect(list.length).toBe(5);
    expect(list.reduce((n, p) => n + p.timesRun, 0)).toBeGreaterThanOrEqual(4);
    expect(list.every((p) => p.lastEditedBy && p.latestVersion)).toBe(true);
  });
});

describe('import and export', () => {
  it('imports a valid file as a new draft and exports it back', async () => {
    const res = await request(h.app).post('/api/procedures/import').set(as(lead)).send(procedureFile(meta, '1', fixtureProcedure()));
    expect(res.status).toBe(201);
    const id = res.body.procedure.id;
    const exported = await request(h.app).get(`/api/procedures/${id}/export`).set(as(lead));
    expect(exported.status).toBe(200);
    expect(exported.headers['content-disposition']).toMatch(/imported-no-spark-draft\.probepath\.json/);
    expect(exported.body).toMatchObject({ format: 'probepath.procedure', formatVersion: 1, ...meta, document: fixtureProcedure() });
  });

  const refused = async (body: unknown) => {
    const before = (await request(h.app).get('/api/procedures').set(as(lead))).body.procedures.length;
    const res = await request(h.app).post('/api/procedures/import').set(as(lead)).send(body as object);
    expect((await request(h.app).get('/api/procedures').set(as(lead))).body.procedures.length).toBe(before);
    return res;
  };

  it('refuses another format version and imports nothing', async () => {
    const res = await refused({ ...procedureFile(meta, '1', fixtureProcedure()), formatVersion: 7 });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/Nothing was imported.*version 7/);
  });

  it('refuses unknown check references, naming the check', async () => {
    const doc = fixtureProcedure();
    const coil = doc.checks[0];
    if (coil.kind === 'measure') coil.outcomes.low = 'ghost';
    const res = await refused(procedureFile(meta, '1', doc));
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/“coil”.*“ghost”/);
  });

  it('refuses a loop without a re-test limit', async () => {
    const doc = fixtureProcedure();
    const unplug = doc.checks.find((c) => c.id === 'unplug')!;
    if (unplug.kind === 'task') unplug.next = 'spark';
    const res = await refused(procedureFile(meta, '1', doc));
    expect(res.status).toBe(400);
    expect(res.body.error.errors.some((e: string) => /loop|cycle/i.test(e))).toBe(true);
  });

  it('refuses an oversized file with 413', async () => {
    const doc = fixtureProcedure();
    doc.checks[0].instruction = 'x'.repeat(20 * 1024 * 1024);
    const res = await refused(procedureFile(meta, '1', doc));
    expect(res.status).toBe(413);
  });

  it('refuses a technician or an apprentice', async () => {
    for (const role of ['tech', 'apprentice'] as const) {
      const token = await h.tokenFor(role);
      expect((await request(h.app).post('/api/procedures/import').set(as(token)).send(procedureFile(meta, '1', fixtureProcedure()))).status).toBe(403);
    }
  });
});

describe('copies, notes and other shops', () => {
  it('keeps a document as a copy, and publishes with a change note', async () => {
    const created = await request(h.app).post('/api/procedures').set(as(lead)).send(meta);
    const id = created.body.procedure.id;
    const copy = await request(h.app).post(`/api/procedures/${id}/copy`).set(as(lead)).send({ document: fixtureProcedure() });
    expect(copy.status).toBe(201);
    expect(copy.body.procedure.title).toBe('Imported no-spark (copy)');
    const published = await request(h.app).post(`/api/procedures/${copy.body.procedure.id}/draft/publish`).set(as(lead)).send({ revision: 1, note: 'First version' });
    expect(published.status).toBe(200);
    const detail = await request(h.app).get(`/api/procedures/${copy.body.procedure.id}`).set(as(lead));
    expect(detail.body.procedure.versions[0]).toMatchObject({ number: 1, note: 'First version' });
    const tech = await h.tokenFor('tech');
    const seen = await request(h.app).get('/api/procedures').set(as(tech));
    expect(seen.body.procedures.some((p: { id: string }) => p.id === copy.body.procedure.id)).toBe(true);
  });

  it('duplicates without a document: the draft when there is one, else the latest version, titled as a numbered copy', async () => {
    const list = (await request(h.app).get('/api/procedures').set(as(lead))).body.procedures as { id: string; title: string; hasDraft: boolean; latestVersion: { number: number } | null }[];
    const published = list.find((p) => !p.hasDraft && p.latestVersion)!;
    const version = await request(h.app).get(`/api/procedures/${published.id}/versions/${published.latestVersion!.number}`).set(as(lead));
    const first = await request(h.app).post(`/api/procedures/${published.id}/copy`).set(as(lead)).send({});
    expect(first.status).toBe(201);
    expect(first.body.procedure).toMatchObject({ title: `${published.title} (copy)`, hasDraft: true, latestVersion: null, timesRun: 0 });
    const copied = await request(h.app).get(`/api/procedures/${first.body.procedure.id}/draft`).set(as(lead));
    expect(copied.body.draft).toMatchObject({ revision: 1, document: version.body.version.document });

    // A second duplicate, and a duplicate of the copy, are numbered from the original's title.
    const second = await request(h.app).post(`/api/procedures/${published.id}/copy`).set(as(lead)).send({});
    expect(second.body.procedure.title).toBe(`${published.title} (copy 2)`);
    const ofCopy = await request(h.app).post(`/api/procedures/${first.body.procedure.id}/copy`).set(as(lead)).send({});
    expect(ofCopy.body.procedure.title).toBe(`${published.title} (copy 3)`);

    // With a draft, the draft is what is copied, not the published version.
    const saved = await request(h.app).put(`/api/procedures/${first.body.procedure.id}/draft`).set(as(lead)).send({ revision: 1, document: fixtureProcedure() });
    expect(saved.status).toBe(200);
    const fromDraft = await request(h.app).post(`/api/procedures/${first.body.procedure.id}/copy`).set(as(lead)).send({});
    const draft = await request(h.app).get(`/api/procedures/${fromDraft.body.procedure.id}/draft`).set(as(lead));
    expect(draft.body.draft.document).toEqual(fixtureProcedure());
  });

  it('refuses a duplicate to a technician or an apprentice, and a malformed document with 400', async () => {
    const mine = (await request(h.app).get('/api/procedures').set(as(lead))).body.procedures[0].id;
    const before = (await request(h.app).get('/api/procedures').set(as(lead))).body.procedures.length;
    for (const role of ['tech', 'apprentice'] as const) {
      const token = await h.tokenFor(role);
      expect((await request(h.app).post(`/api/procedures/${mine}/copy`).set(as(token)).send({})).status).toBe(403);
    }
    const bad = await request(h.app).post(`/api/procedures/${mine}/copy`).set(as(lead)).send({ document: { checks: 'none' } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.code).toBe('invalid_document');
    expect((await request(h.app).get('/api/procedures').set(as(lead))).body.procedures.length).toBe(before);
  });

  it("answers 404 for another shop's procedure on export and copy", async () => {
    const other = await h.otherShopToken();
    const mine = (await request(h.app).get('/api/procedures').set(as(lead))).body.procedures[0].id;
    expect((await request(h.app).get(`/api/procedures/${mine}/export`).set(as(other))).status).toBe(404);
    expect((await request(h.app).post(`/api/procedures/${mine}/copy`).set(as(other)).send({ document: fixtureProcedure() })).status).toBe(404);
    expect((await request(h.app).post(`/api/procedures/${mine}/copy`).set(as(other)).send({})).status).toBe(404);
  });
});
