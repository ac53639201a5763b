import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PICTURE_MAX_BYTES } from '@shared/procedures/pictures';
import type { ProcedureDocument } from '@shared/engine/procedure';
import { ProcedurePicture } from '@server/procedure-pictures/procedure-picture.entity';
import { createHarness, type Harness } from '../support/api-harness';
import { fixtureProcedure } from '../support/fixture-procedure';
import { filesUnder, JPEG, PNG, WEBP } from '../support/photos';

let h: Harness;
let lead: string;
let procedureId: string;
const as = (token: string) => ({ authorization: `Bearer ${token}` });
const pictureRows = () => h.runtime.ctx.ds.getRepository(ProcedurePicture).count();
const storedFiles = () => filesUnder(path.join(h.dataDir, 'photos'));
const upload = (token: string, file: Buffer, name: string, id = procedureId) =>
  request(h.app).post(`/api/procedures/${id}/pictures`).set(as(token)).attach('picture', file, { filename: name, contentType: 'image/png' });
const withPicture = (src: string): ProcedureDocument => {
  const doc = fixtureProcedure();
  doc.checks[0].pictures = [{ src, alt: 'Pickup connector P1, pin 1 left, pin 2 right, seen from the wire side' }];
  return doc;
};
const revisionOf = async (id = procedureId, token = lead) => (await request(h.app).get(`/api/procedures/${id}/draft`).set(as(token))).body.draft.revision as number;

beforeAll(async () => {
  h = await createHarness();
  lead = await h.tokenFor('lead');
  const created = await request(h.app).post('/api/procedures').set(as(lead)).send({ title: 'No spark, pictures', complaint: 'Cranks but no spark', family: 'Test twins' });
  procedureId = created.body.procedure.id;
});
afterAll(() => h.close());

describe('uploading a procedure picture', () => {
  it('stores a PNG for a lead, answers its id, and serves the bytes to every role of the shop', async () => {
    const res = await upload(lead, PNG, 'pinout.png');
    expect(res.status).toBe(201);
    expect(res.body.picture).toEqual({ id: expect.stringMatching(/^[0-9a-f-]{36}$/), contentType: 'image/png', size: PNG.length, createdAt: expect.any(String) });
    for (const role of ['owner', 'lead', 'tech', 'apprentice'] as const) {
      const got = await request(h.app).get(`/api/procedure-pictures/${res.body.picture.id}`).set(as(await h.tokenFor(role))).buffer(true).parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      });
      expect(got.status, role).toBe(200);
      expect(got.headers['content-type']).toBe('image/png');
      expect(got.headers['x-content-type-options']).toBe('nosniff');
      expect(Buffer.from(got.body).equals(PNG)).toBe(true);
    }
  });

  it('takes JPEG and WebP by their content, and an owner may upload too', async () => {
    expect((await upload(lead, JPEG, 'a.bin')).body.picture.contentType).toBe('image/jpeg');
    expect((await upload(await h.tokenFor('owner'), WEBP, 'a.png')).body.picture.contentType).toBe('image/webp');
  });

  it('refuses technicians and apprentices with 403 and stores nothing', async () => {
    const before = { rows: await pictureRows(), files: storedFiles().length };
    expect((await upload(await h.tokenFor('tech'), PNG, 'a.png')).status).toBe(403);
    expect((await upload(await h.tokenFor('apprentice'), PNG, 'a.png')).status).toBe(403);
    expect({ rows: await pictureRows(), files: storedFiles().length }).toEqual(before);
  });

  it('refuses a text file dressed up as a .png with 415, naming the formats', async () => {
    const before = storedFiles().length;
    const res = await upload(lead, Buffer.from('Pin 1 blue/yellow, pin 2 green/white\n'), 'pinout.png');
    expect(res.status).toBe(415);
    expect(res.body.error.code).toBe('unsupported_picture_type');
    expect(res.body.error.message).toMatch(/JPEG, PNG or WebP/);
    expect(res.body.error.fields.picture).toBeDefined();
    expect(storedFiles()).toHaveLength(before);
  });

  it('refuses a picture over 5 MB with 413 in words and keeps nothing', async () => {
    const before = { rows: await pictureRows(), files: storedFiles().length };
    const big = Buffer.concat([PNG, Buffer.alloc(PICTURE_MAX_BYTES + 1 - PNG.length)]);
    const res = await upload(lead, big, 'huge.png');
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('picture_too_large');
    expect(res.body.error.message).toContain('5 MB');
    expect({ rows: await pictureRows(), files: storedFiles().length }).toEqual(before);
  });

  it('asks for the file in “picture” and refuses extra fields', async () => {
    const none = await request(h.app).post(`/api/procedures/${procedureId}/pictures`).set(as(lead)).send({});
    expect(none.status).toBe(400);
    const misnamed = await request(h.app).post(`/api/procedures/${procedureId}/pictures`).set(as(lead)).attach('photo', PNG, 'a.png');
    expect(misnamed.status).toBe(400);
    const extra = await request(h.app).post(`/api/procedures/${procedureId}/pictures`).set(as(lead)).field('shopId', 'elsewhere').attach('picture', PNG, 'a.png');
    expect(extra.status).toBe(400);
  });

  it('stores a retried upload once per Idempotency-Key and refuses the key for another file', async () => {
    const rows = await pictureRows();
    const first = await upload(lead, PNG, 'a.png').set('Idempotency-Key', 'picture-key-0001');
    const retry = await upload(lead, PNG, 'a.png').set('Idempotency-Key', 'picture-key-0001');
    expect(first.status).toBe(201);
    expect(retry.status).toBe(201);
    expect(retry.headers['idempotent-replayed']).toBe('true');
    expect(retry.body.picture.id).toBe(first.body.picture.id);
    expect(await pictureRows()).toBe(rows + 1);
    expect((await upload(lead, JPEG, 'a.png').set('Idempotency-Key', 'picture-key-0001')).status).toBe(422);
  });

  it('answers 404 for a procedure that is not in the shop', async () => {
    expect((await upload(lead, PNG, 'a.png', '00000000-0000-4000-8000-000000000000')).status).toBe(404);
  });
});

describe('documents that show pictures', () => {
  let pictureId: string;
  beforeAll(async () => {
    pictureId = (await upload(lead, PNG, 'pinout.png')).body.picture.id;
  });

  it('saves and publishes a check that shows a picture of the shop, and a tech reads it in the version', async () => {
    const saved = await request(h.app).put(`/api/procedures/${procedureId}/draft`).set(as(lead)).send({ revision: await revisionOf(), document: withPicture(pictureId) });
    expect(saved.status).toBe(200);
    const published = await request(h.app).post(`/api/procedures/${procedureId}/draft/publish`).set(as(lead)).send({ revision: saved.body.revision });
    expect(published.status).toBe(200);
    const version = await request(h.app).get(`/api/procedures/${procedureId}/versions/${published.body.version}`).set(as(await h.tokenFor('tech')));
    expect(version.body.version.document.checks[0].pictures).toEqual([{ src: pictureId, alt: expect.stringContaining('Pickup connector') }]);
  });

  it('refuses a document showing a picture id this shop does not have, naming the field', async () => {
    await request(h.app).post(`/api/procedures/${procedureId}/draft`).set(as(lead)).send({ fromVersion: 1 });
    const revision = await revisionOf();
    const res = await request(h.app).put(`/api/procedures/${procedureId}/draft`).set(as(lead)).send({ revision, document: withPicture('11111111-2222-4333-8444-555555555555') });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('unknown_picture');
    expect(res.body.error.message).toMatch(/Check “coil”: picture 1 .* is not stored in this shop/);
    expect(res.body.error.fields).toEqual({ 'checks[0].pictures[0].src': expect.stringContaining('not stored in this shop') });
    expect(await revisionOf()).toBe(revision);
  });

  it('refuses a picture src that is not a picture id, as a badly formed document', async () => {
    const res = await request(h.app).put(`/api/procedures/${procedureId}/draft`).set(as(lead)).send({ revision: await revisionOf(), document: withPicture('https://example.test/pinout.png') });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toContain('A picture is the id of a picture uploaded to this shop.');
  });

  it('never shows another shop the picture, nor lets it save or import a document that points at it', async () => {
    const intruder = await h.otherShopToken();
    expect((await request(h.app).get(`/api/procedure-pictures/${pictureId}`).set(as(intruder))).status).toBe(404);
    expect((await upload(intruder, PNG, 'a.png')).status).toBe(404);
    const theirs = await request(h.app).post('/api/procedures').set(as(intruder)).send({ title: 'Borrowed', complaint: 'Cranks but no spark', family: 'Test twins' });
    const saved = await request(h.app).put(`/api/procedures/${theirs.body.procedure.id}/draft`).set(as(intruder)).send({ revision: 1, document: withPicture(pictureId) });
    expect(saved.status).toBe(400);
    expect(saved.body.error.code).toBe('unknown_picture');
    const file = (await request(h.app).get(`/api/procedures/${procedureId}/export?version=1`).set(as(lead))).body;
    expect(file.document.checks[0].pictures[0].src).toBe(pictureId);
    const imported = await request(h.app).post('/api/procedures/import').set(as(intruder)).send(file);
    expect(imported.status).toBe(400);
    expect(imported.body.error.code).toBe('invalid_procedure_file');
    expect(imported.body.error.message).toMatch(/^Nothing was imported\. A procedure file names its pictures but does not carry them/);
    expect(imported.body.error.errors).toContainEqual(expect.stringMatching(/Check “coil”: picture 1 .* is not stored in this shop/));
    const list = await request(h.app).get('/api/procedures').set(as(intruder));
    expect(list.body.procedures.map((p: { title: string }) => p.title)).toEqual(['Borrowed']);
  });

  it('imports the same file back into its own shop with the pictures working', async () => {
    const file = (await request(h.app).get(`/api/procedures/${procedureId}/export?version=1`).set(as(lead))).body;
    const imported = await request(h.app).post('/api/procedures/import').set(as(lead)).send(file);
    expect(imported.status).toBe(201);
    const draft = await request(h.app).get(`/api/procedures/${imported.body.procedure.id}/draft`).set(as(lead));
    expect(draft.body.draft.document.checks[0].pictures[0].src).toBe(pictureId);
  });

  it('never deletes a picture, even straight in the database', async () => {
    await expect(h.runtime.ctx.ds.query('DELETE FROM procedure_picture WHERE id = ?', [pictureId])).rejects.toThrow(/never deleted/);
    expect((await request(h.app).get(`/api/procedure-pictures/${pictureId}`).set(as(lead))).status).toBe(200);
  });
});
