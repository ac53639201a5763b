import { PDFParse } from 'pdf-parse';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createHarness, demoEmail, type Harness } from '../support/api-harness';
import { JPEG } from '../support/photos';
import { setUpWorkshop } from '../support/workshop-setup';

let h: Harness;
let tech: string;
let diagnosisId: string;
const as = (token: string) => ({ authorization: `Bearer ${token}` });
const pdfOf = (token: string, id = diagnosisId) =>
  request(h.app).get(`/api/diagnoses/${id}/report.pdf`).set(as(token)).buffer(true).parse((res, done) => {
    const chunks: Buffer[] = [];
    res.on('data', (c: Buffer) => chunks.push(c));
    res.on('end', () => done(null, Buffer.concat(chunks)));
  });
async function textOf(pdf: Buffer): Promise<string> {
  const parser = new PDFParse({ data: new Uint8Array(pdf) });
  try {
    // Lines wrap wherever the page width says: compare words, not line breaks.
    return (await parser.getText()).text.replace(/\s+/g, ' ');
  } finally {
    await parser.destroy();
  }
}
const emailReport = (token: string, body: object, key?: string) => {
  const r = request(h.app).post(`/api/diagnoses/${diagnosisId}/report/email`).set(as(token));
  return (key ? r.set('Idempotency-Key', key) : r).send(body);
};

/** The fixture procedure run to its end: a retracted first coil reading, a note, a photo of the coil step. */
beforeAll(async () => {
  h = await createHarness();
  tech = await h.tokenFor('tech');
  const ids = await setUpWorkshop(h);
  const started = await request(h.app).post('/api/diagnoses').set(as(tech)).send({ procedureId: ids.procedureId, jobId: ids.jobId, meterId: ids.meterId, ambientC: 20 });
  diagnosisId = started.body.diagnosis.id;
  const step = (body: object) => request(h.app).post(`/api/diagnoses/${diagnosisId}/steps`).set(as(tech)).send(body);
  await step({ checkId: 'coil', reading: '5,20 kΩ' });
  await request(h.app).post(`/api/diagnoses/${diagnosisId}/back`).set(as(tech)).send({});
  const coil = await step({ checkId: 'coil', reading: '0,455 kΩ', note: 'Leads nulled first.' });
  await step({ checkId: 'spark', choiceId: 'none' });
  await step({ checkId: 'unplug' });
  await step({ checkId: 'diode-fwd', reading: '0.58' });
  await step({ checkId: 'diode-rev', reading: 'OL' });
  await request(h.app).post(`/api/diagnoses/${diagnosisId}/photos`).set(as(tech)).field('stepId', coil.body.step.id).attach('photo', JPEG, 'coil.jpg');
});
afterAll(() => h.close());

describe('the PDF', () => {
  it('is not e-mailed before the diagnosis is concluded', async () => {
    const res = await emailReport(tech, { to: 'ada.quill@example.com' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('not_concluded');
  });

  it('names the machine, the customer, each reading as typed and the finding, and leaves the retracted reading out', async () => {
    const concluded = await request(h.app).post(`/api/diagnoses/${diagnosisId}/conclude`).set(as(tech)).send({ note: 'Spark restored after the plug cap was refitted.', parts: 'Plug cap', labourMinutes: 95 });
    expect(concluded.status).toBe(200);
    const res = await pdfOf(tech);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(res.headers['content-disposition']).toMatch(/filename="report-2019-veltro-t650-\d{4}-\d{2}-\d{2}\.pdf"/);
    const text = await textOf(res.body);
    for (const expected of [
      'Harrow Lane Motor Works',
      '2019 Veltro T650',
      '7VLTR65A5TK104233',
      '21,400 km',
      'Ada Quill',
      'Turns over, never catches',
      'Pickup coil resistance',
      '0,455 kΩ',
      '400–500 Ω',
      'No flash',
      '0.58',
      'OL',
      'In spec',
      'Ignition circuit proven',
      'Look at fuel and compression.',
      'Spark restored after the plug cap was refitted.',
      'Plug cap',
      '1 h 35 min',
      'Leads nulled first.',
      'service manual',
    ]) {
      expect(text, expected).toContain(expected);
    }
    expect(text).not.toContain('5,20 kΩ');
    expect(text).toContain('1 reading was taken again');
    expect(res.body.includes('/Subtype /Image')).toBe(true);
  });

  it('is there for an apprentice once concluded, and for nobody in another shop', async () => {
    expect((await pdfOf(await h.tokenFor('apprentice'))).status).toBe(200);
    expect((await pdfOf(await h.otherShopToken())).status).toBe(404);
  });
});

describe('e-mailing the report', () => {
  it('says in words that the job has no customer e-mail when no address is given', async () => {
    const res = await emailReport(tech, {});
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('no_customer_email');
    expect(res.body.error.message).toMatch(/no customer e-mail/);
  });

  it('refuses an address that is not one', async () => {
    const res = await emailReport(tech, { to: 'ada at example' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.to).toBeDefined();
  });

  it('sends it once per Idempotency-Key with the PDF attached, captured for the owner’s outbox', async () => {
    const first = await emailReport(tech, { to: 'Ada.Quill@example.com' }, 'report-mail-0001');
    expect(first.status).toBe(200);
    expect(first.body.sent).toMatchObject({ to: 'ada.quill@example.com', subject: 'Diagnosis report: your 2019 Veltro T650' });
    const retry = await emailReport(tech, { to: 'Ada.Quill@example.com' }, 'report-mail-0001');
    expect(retry.status).toBe(200);
    expect(retry.headers['idempotent-replayed']).toBe('true');

    const captured = await h.mailTo('ada.quill@example.com');
    expect(captured).toHaveLength(1);
    expect(captured[0].subject).toBe('Diagnosis report: your 2019 Veltro T650');
    expect(captured[0].text).toContain('Ignition circuit proven');
    expect(captured[0].attachments).toEqual([{ filename: first.body.sent.filename, contentType: 'application/pdf', size: expect.any(Number) }]);
    expect(captured[0].attachments[0].size).toBeGreaterThan(10_000);

    const outbox = await request(h.app).get('/api/mail').set(as(await h.tokenFor('owner')));
    expect(outbox.body.messages.map((m: { to: string }) => m.to)).toContain('ada.quill@example.com');
  });

  it('goes to the job’s customer e-mail when no address is given', async () => {
    const detail = await request(h.app).get(`/api/diagnoses/${diagnosisId}`).set(as(tech));
    const { job, meter, procedureId } = detail.body.diagnosis;
    const withEmail = await request(h.app).post('/api/jobs').set(as(tech)).send({ machineId: job.machine.id, customerName: 'Ada Quill', customerEmail: 'ada@quill.example', complaint: 'Dies when warm' });
    const started = await request(h.app).post('/api/diagnoses').set(as(tech)).send({ procedureId, jobId: withEmail.body.job.id, meterId: meter.id, ambientC: 20 });
    const id = started.body.diagnosis.id;
    await request(h.app).post(`/api/diagnoses/${id}/steps`).set(as(tech)).send({ checkId: 'coil', reading: '450' });
    await request(h.app).post(`/api/diagnoses/${id}/steps`).set(as(tech)).send({ checkId: 'spark', choiceId: 'flash' });
    await request(h.app).post(`/api/diagnoses/${id}/conclude`).set(as(tech)).send({});
    const res = await request(h.app).post(`/api/diagnoses/${id}/report/email`).set(as(tech)).send({});
    expect(res.status).toBe(200);
    expect(res.body.sent.to).toBe('ada@quill.example');
    expect(await h.mailTo('ada@quill.example')).toHaveLength(1);
  });

  it('is not for an apprentice', async () => {
    const res = await emailReport(await h.tokenFor('apprentice'), { to: demoEmail('owner') });
    expect(res.status).toBe(403);
  });
});
