import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Diagnosis } from '@server/diagnoses/diagnosis.entity';
import { DiagnosisStep } from '@server/diagnoses/diagnosis-step.entity';
import { createHarness, type Harness } from '../support/api-harness';
import { setUpWorkshop } from '../support/workshop-setup';

let h: Harness;
let tech: string;
let ids: Awaited<ReturnType<typeof setUpWorkshop>>;
let diagnosisId: string;
const as = (token: string) => ({ authorization: `Bearer ${token}` });
const steps = () => h.runtime.ctx.ds.getRepository(DiagnosisStep).find({ where: { diagnosisId }, order: { seq: 'ASC' } });
const submit = (body: object, key?: string) => {
  const r = request(h.app).post(`/api/diagnoses/${diagnosisId}/steps`).set(as(tech));
  return (key ? r.set('Idempotency-Key', key) : r).send(body);
};

beforeAll(async () => {
  h = await createHarness();
  tech = await h.tokenFor('tech');
  ids = await setUpWorkshop(h);
});
afterAll(() => h.close());

describe('starting', () => {
  it('starts once per Idempotency-Key, pinned to the published version, at its first check', async () => {
    const body = { procedureId: ids.procedureId, jobId: ids.jobId, meterId: ids.meterId, ambientC: 32 };
    const first = await request(h.app).post('/api/diagnoses').set(as(tech)).set('Idempotency-Key', 'start-key-0001').send(body);
    const retry = await request(h.app).post('/api/diagnoses').set(as(tech)).set('Idempotency-Key', 'start-key-0001').send(body);
    expect(first.status).toBe(201);
    expect(retry.status).toBe(201);
    expect(retry.headers['idempotent-replayed']).toBe('true');
    expect(retry.body.diagnosis.id).toBe(first.body.diagnosis.id);
    expect(await h.runtime.ctx.ds.getRepository(Diagnosis).count()).toBe(1);
    expect(first.body.diagnosis).toMatchObject({ status: 'open', versionNumber: 1, currentCheckId: 'coil', ambientC: 32 });
    diagnosisId = first.body.diagnosis.id;
  });

  it('cannot be started by an apprentice', async () => {
    const apprentice = await h.tokenFor('apprentice');
    const res = await request(h.app).post('/api/diagnoses').set(as(apprentice)).send({ procedureId: ids.procedureId, jobId: ids.jobId, meterId: ids.meterId, ambientC: 20 });
    expect(res.status).toBe(403);
  });
});

describe('steps', () => {
  it('re-parses and judges the reading itself: 0,52 kΩ at 32 °C sits on the edge of the copper-corrected window', async () => {
    // 400–500 Ω at 20 °C × (1 + 0.00393 × 12) = 418.9–523.6 Ω (IEC 60028 annealed-copper coefficient);
    // 520 Ω ± (0.8 % + 2 counts of 1 Ω) = 513.8–526.2 Ω straddles the upper limit, so marginal.
    const res = await submit({ checkId: 'coil', reading: '0,52 kΩ' }, 'step-key-0001');
    expect(res.status).toBe(201);
    expect(res.body.step).toMatchObject({ readingText: '0,52 kΩ', valueSi: 520, verdict: 'marginal', checkId: 'coil' });
    expect(res.body.step.evaluation.limits.max).toBeCloseTo(523.58, 2);
  });

  it('replays the same answer for the same key and records nothing twice', async () => {
    const again = await submit({ checkId: 'coil', reading: '0,52 kΩ' }, 'step-key-0001');
    expect(again.status).toBe(201);
    expect(again.headers['idempotent-replayed']).toBe('true');
    expect((await steps()).length).toBe(1);
  });

  it('refuses the same key with a different body', async () => {
    const res = await submit({ checkId: 'coil', reading: '0.45 kΩ' }, 'step-key-0001');
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('idempotency_key_reused');
    expect((await steps()).length).toBe(1);
  });

  it('never takes a verdict from the client', async () => {
    const res = await submit({ checkId: 'spark', choiceId: 'none', verdict: 'in_spec' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('unknown_field');
  });

  it('goes back by retracting the last step, which is kept', async () => {
    const back = await request(h.app).post(`/api/diagnoses/${diagnosisId}/back`).set(as(tech)).set('Idempotency-Key', 'back-key-0001').send({});
    expect(back.status).toBe(200);
    expect(back.body.currentCheckId).toBe('coil');
    const all = await steps();
    expect(all).toHaveLength(1);
    expect(all[0]).toMatchObject({ retracted: true, readingText: '0,52 kΩ', valueSi: 520 });
    const replay = await request(h.app).post(`/api/diagnoses/${diagnosisId}/back`).set(as(tech)).set('Idempotency-Key', 'back-key-0001').send({});
    expect(replay.body.retractedSeq).toBe(1);
    expect((await steps()).filter((s) => s.retracted)).toHaveLength(1);
  });

  it('explains a reading of the wrong quantity and saves nothing', async () => {
    const res = await submit({ checkId: 'coil', reading: '12.6 V' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('unreadable_reading');
    expect(res.body.error.fields.reading).toBeDefined();
    expect((await steps()).length).toBe(1);
  });

  it('refuses a step for a check that is not current', async () => {
    const res = await submit({ checkId: 'diode-fwd', reading: '0.6' });
    expect(res.status).toBe(409);
    expect(res.body.error.currentCheckId).toBe('coil');
  });

  it('walks the path to a finding through an observation, a task and a diode read both ways', async () => {
    expect((await submit({ checkId: 'coil', reading: '455 ohm' })).body.currentCheckId).toBe('spark');
    expect((await submit({ checkId: 'spark', choiceId: 'none', note: 'No flash on either lead' })).body.currentCheckId).toBe('unplug');
    expect((await submit({ checkId: 'unplug' })).body.currentCheckId).toBe('diode-fwd');
    expect((await submit({ checkId: 'diode-fwd', reading: '0.58' })).body.step.verdict).toBe('in_spec');
    const reverse = await submit({ checkId: 'diode-rev', reading: 'OL' });
    expect(reverse.body.step).toMatchObject({ overRange: true, valueSi: null, verdict: 'in_spec' });
    expect(reverse.body.currentCheckId).toBe('ok');
  });

  it('concludes only at a finding, then takes no more steps', async () => {
    const res = await request(h.app).post(`/api/diagnoses/${diagnosisId}/conclude`).set(as(tech)).send({ note: 'Ignition proven.', parts: '', labourMinutes: 40 });
    expect(res.status).toBe(200);
    const detail = await request(h.app).get(`/api/diagnoses/${diagnosisId}`).set(as(tech));
    expect(detail.body.diagnosis).toMatchObject({ status: 'concluded', finding: 'Ignition circuit proven', stepCount: 5 });
    expect(detail.body.diagnosis.steps).toHaveLength(6);
    expect((await submit({ checkId: 'ok' })).status).toBe(409);
  });
});

describe('who can see it', () => {
  it('lets an apprentice replay a concluded diagnosis but not see open ones', async () => {
    const apprentice = await h.tokenFor('apprentice');
    expect((await request(h.app).get(`/api/diagnoses/${diagnosisId}`).set(as(apprentice))).status).toBe(200);
    const open = await request(h.app)
      .post('/api/diagnoses')
      .set(as(tech))
      .send({ procedureId: ids.procedureId, jobId: ids.jobId, meterId: ids.meterId, ambientC: 18 });
    expect((await request(h.app).get(`/api/diagnoses/${open.body.diagnosis.id}`).set(as(apprentice))).status).toBe(404);
    const list = await request(h.app).get('/api/diagnoses?status=open').set(as(apprentice));
    expect(list.body.diagnoses.map((d: { id: string }) => d.id)).toEqual([diagnosisId]);
  });

  it("never shows one shop's diagnosis to another", async () => {
    const intruder = await h.otherShopToken();
    expect((await request(h.app).get(`/api/diagnoses/${diagnosisId}`).set(as(intruder))).status).toBe(404);
    expect((await request(h.app).post(`/api/diagnoses/${diagnosisId}/abandon`).set(as(intruder)).send({ reason: 'x' })).status).toBe(404);
    expect((await request(h.app).get('/api/diagnoses').set(as(intruder))).body.diagnoses).toEqual([]);
  });
});
