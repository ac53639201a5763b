import fs from 'node:fs';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PHOTO_MAX_BYTES } from '@shared/photos/schemas';
import { DiagnosisPhoto } from '@server/photos/photo.entity';
import { createHarness, type Harness } from '../support/api-harness';
import { filesUnder, JPEG, PNG, WEBP } from '../support/photos';
import { setUpWorkshop } from '../support/workshop-setup';

let h: Harness;
let tech: string;
let shopId: string;
let diagnosisId: string;
let stepId: string;
const as = (token: string) => ({ authorization: `Bearer ${token}` });
const photoRows = () => h.runtime.ctx.ds.getRepository(DiagnosisPhoto).count();
const storedFiles = () => filesUnder(path.join(h.dataDir, 'photos'));
const upload = (token: string, file: Buffer, name: string, fields: Record<string, string> = {}, id = diagnosisId) => {
  const r = request(h.app).post(`/api/diagnoses/${id}/photos`).set(as(token));
  for (const [k, v] of Object.entries(fields)) r.field(k, v);
  return r.attach('photo', file, { filename: name, contentType: 'image/jpeg' });
};

beforeAll(async () => {
  h = await createHarness();
  tech = await h.tokenFor('tech');
  const ids = await setUpWorkshop(h);
  const started = await request(h.app).post('/api/diagnoses').set(as(tech)).send({ procedureId: ids.procedureId, jobId: ids.jobId, meterId: ids.meterId, ambientC: 20 });
  diagnosisId = started.body.diagnosis.id;
  const step = await request(h.app).post(`/api/diagnoses/${diagnosisId}/steps`).set(as(tech)).send({ checkId: 'coil', reading: '455 Ω' });
  stepId = step.body.step.id;
  shopId = (await request(h.app).get('/api/auth/me').set(as(tech))).body.user.shopId;
});
afterAll(() => h.close());

describe('uploading', () => {
  let photoId: string;

  it('stores a JPEG of a step under a random name in the shop’s folder and lists it on the diagnosis', async () => {
    const res = await upload(tech, JPEG, 'IMG_0412.jpg', { stepId });
    expect(res.status).toBe(201);
    expect(res.body.photo).toMatchObject({ stepId, contentType: 'image/jpeg', size: JPEG.length });
    photoId = res.body.photo.id;
    const files = storedFiles();
    expect(files).toHaveLength(1);
    expect(files[0]).toMatch(new RegExp(`^${shopId}/[0-9a-f]{32}\\.jpg$`));
    expect(fs.readFileSync(path.join(h.dataDir, 'photos', files[0])).equals(JPEG)).toBe(true);
    const detail = await request(h.app).get(`/api/diagnoses/${diagnosisId}`).set(as(tech));
    expect(detail.body.diagnosis.photos).toEqual([{ id: photoId, stepId, contentType: 'image/jpeg', size: JPEG.length, createdAt: expect.any(String) }]);
  });

  it('takes PNG and WebP, judged by their content, and a photo of the whole diagnosis without a step', async () => {
    const png = await upload(tech, PNG, 'bench.jpg');
    expect(png.status).toBe(201);
    expect(png.body.photo).toMatchObject({ stepId: null, contentType: 'image/png' });
    const webp = await upload(tech, WEBP, 'bench.png');
    expect(webp.status).toBe(201);
    expect(webp.body.photo.contentType).toBe('image/webp');
  });

  it('serves the bytes to the shop with the stored type, privately and without sniffing', async () => {
    const res = await request(h.app).get(`/api/photos/${photoId}`).set(as(tech)).buffer(true);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('image/jpeg');
    expect(res.headers['cache-control']).toMatch(/^private/);
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(Buffer.from(res.body).equals(JPEG)).toBe(true);
  });

  it('refuses a photo over 10 MB with 413 in words and keeps nothing', async () => {
    const before = { rows: await photoRows(), files: storedFiles().length };
    const big = Buffer.concat([JPEG, Buffer.alloc(PHOTO_MAX_BYTES + 1 - JPEG.length)]);
    const res = await upload(tech, big, 'huge.jpg');
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('photo_too_large');
    expect(res.body.error.message).toContain('10 MB');
    expect({ rows: await photoRows(), files: storedFiles().length }).toEqual(before);
  });

  it('refuses a text file dressed up as a .jpg, whatever the name and claimed type say', async () => {
    const before = storedFiles().length;
    const res = await upload(tech, Buffer.from('Pickup coil 455 ohm, spark none.\n'), 'coil.jpg');
    expect(res.status).toBe(415);
    expect(res.body.error.code).toBe('unsupported_photo_type');
    expect(res.body.error.message).toMatch(/JPEG, PNG or WebP/);
    expect(storedFiles()).toHaveLength(before);
  });

  it('refuses a PDF renamed .png, naming what it really is', async () => {
    const res = await upload(tech, Buffer.from('%PDF-1.7\n%âãÏÓ\n1 0 obj\n<<>>\nendobj\n'), 'wiring.png');
    expect(res.status).toBe(415);
    expect(res.body.error.message).toContain('PDF');
  });

  it('never lets a file name with path segments choose where the file goes', async () => {
    const before = new Set(storedFiles());
    const res = await upload(tech, JPEG, '../../../../tmp/escape.jpg');
    const windows = await upload(tech, JPEG, '..\\..\\jwt-secret');
    expect(res.status).toBe(201);
    expect(windows.status).toBe(201);
    const added = storedFiles().filter((f) => !before.has(f));
    expect(added).toHaveLength(2);
    for (const f of added) expect(f).toMatch(new RegExp(`^${shopId}/[0-9a-f]{32}\\.jpg$`));
    expect(filesUnder(h.dataDir).filter((f) => /escape|jwt-secret\./.test(f))).toEqual([]);
    expect(fs.existsSync('/tmp/escape.jpg')).toBe(false);
  });

  it('asks for the picture when the field is missing or misnamed, and refuses unknown fields', async () => {
    const none = await request(h.app).post(`/api/diagnoses/${diagnosisId}/photos`).set(as(tech)).field('stepId', stepId);
    expect(none.status).toBe(400);
    expect(none.body.error.code).toBe('photo_missing');
    const misnamed = await request(h.app).post(`/api/diagnoses/${diagnosisId}/photos`).set(as(tech)).attach('picture', JPEG, 'a.jpg');
    expect(misnamed.status).toBe(400);
    const extra = await upload(tech, JPEG, 'a.jpg', { shopId: 'elsewhere' });
    expect(extra.status).toBe(400);
    const json = await request(h.app).post(`/api/diagnoses/${diagnosisId}/photos`).set(as(tech)).send({});
    expect(json.status).toBe(400);
  });

  it('refuses a step that is not on this diagnosis', async () => {
    const res = await upload(tech, JPEG, 'a.jpg', { stepId: '00000000-0000-4000-8000-000000000000' });
    expect(res.status).toBe(404);
    expect(res.body.error.fields.stepId).toBeDefined();
  });

  it('stores a retried upload once per Idempotency-Key and refuses the key for another photo', async () => {
    const rows = await photoRows();
    const first = await upload(tech, PNG, 'a.png').set('Idempotency-Key', 'photo-key-0001');
    const retry = await upload(tech, PNG, 'a.png').set('Idempotency-Key', 'photo-key-0001');
    expect(retry.status).toBe(201);
    expect(retry.headers['idempotent-replayed']).toBe('true');
    expect(retry.body.photo.id).toBe(first.body.photo.id);
    expect(await photoRows()).toBe(rows + 1);
    const other = await upload(tech, JPEG, 'a.png').set('Idempotency-Key', 'photo-key-0001');
    expect(other.status).toBe(422);
  });
});

describe('who may upload and fetch', () => {
  let photoId: string;
  beforeAll(async () => {
    photoId = (await upload(tech, JPEG, 'a.jpg')).body.photo.id;
  });

  it('answers 404 to another shop, uploading or fetching', async () => {
    const intruder = await h.otherShopToken();
    const rows = await photoRows();
    expect((await upload(intruder, JPEG, 'a.jpg')).status).toBe(404);
    expect(await photoRows()).toBe(rows);
    expect((await request(h.app).get(`/api/photos/${photoId}`).set(as(intruder))).status).toBe(404);
  });

  it('refuses an apprentice’s upload, and shows an apprentice no photo of a diagnosis still open', async () => {
    const apprentice = await h.tokenFor('apprentice');
    const res = await upload(apprentice, JPEG, 'a.jpg');
    expect(res.status).toBe(403);
    expect((await request(h.app).get(`/api/photos/${photoId}`).set(as(apprentice))).status).toBe(404);
  });

  it('takes no photos on an abandoned diagnosis', async () => {
    await request(h.app).post(`/api/diagnoses/${diagnosisId}/abandon`).set(as(tech)).send({ reason: 'Customer took the bike away.' });
    const res = await upload(tech, JPEG, 'a.jpg');
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('diagnosis_abandoned');
  });
});
