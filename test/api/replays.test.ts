import crypto from 'node:crypto';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DiagnosisDetail, DiagnosisSummary } from '@shared/api/diagnosis-types';
import type { PracticeAttemptView } from '@shared/api/replay-types';
import { hashPassword } from '@server/auth/passwords';
import { Shop } from '@server/shops/shop.entity';
import { User } from '@server/users/user.entity';
import { createHarness, demoEmail, type Harness } from '../support/api-harness';

/**
 * Replays, step comments and practice on the demo shop's diagnoses: who may read and write what, and that
 * practice answers are scored by the server from the recorded step.
 */
let h: Harness;
const tokens: Record<string, string> = {};
let tessa: DiagnosisDetail;
let fellrunner: DiagnosisDetail;
let openId: string;

const as = (who: string) => ({ authorization: `Bearer ${tokens[who]}` });
const get = (who: string, path: string) => request(h.app).get(path).set(as(who));
const post = (who: string, path: string, body: object, key?: string) => {
  const r = request(h.app).post(path).set(as(who));
  return (key ? r.set('Idempotency-Key', key) : r).send(body);
};
const seqOf = (d: DiagnosisDetail, checkId: string, retracted = false) => d.steps.find((s) => s.checkId === checkId && s.retracted === retracted)!.seq;

async function addMember(shopId: string, email: string, role: User['role']): Promise<string> {
  const password = 'practice-pass-2026';
  await h.runtime.ctx.ds.getRepository(User).save({ shopId, email, name: email.split('@')[0], role, active: true, passwordHash: await hashPassword(password) });
  const res = await request(h.app).post('/api/auth/sign-in').send({ email, password });
  return res.body.token as string;
}

beforeAll(async () => {
  h = await createHarness({ demoWorkshop: true });
  for (const role of ['owner', 'lead', 'tech', 'apprentice'] as const) tokens[role] = await h.tokenFor(role);
  const shops = h.runtime.ctx.ds.getRepository(Shop);
  const demoShop = (await h.runtime.ctx.ds.getRepository(User).findOneByOrFail({ email: demoEmail('apprentice') })).shopId;
  const otherShop = (await shops.findOneByOrFail({ name: 'Copperfield Small Engines' })).id;
  tokens.apprentice2 = await addMember(demoShop, 'noor@harrowlane.example', 'apprentice');
  tokens.outsider = await addMember(otherShop, 'pip@copperfield.example', 'apprentice');

  const all: DiagnosisSummary[] = (await get('lead', '/api/diagnoses')).body.diagnoses;
  // The hand-written stories, by their customers; the generated diagnoses run on the same models.
  const detail = async (customer: string) => (await get('lead', `/api/diagnoses/${all.find((d) => d.customerName === customer)!.id}`)).body.diagnosis as DiagnosisDetail;
  tessa = await detail('Gethin Marlowe');
  fellrunner = await detail('Bram Visser');
  openId = all.find((d) => d.status === 'open')!.id;
  // Seeding the demo shop's sixty diagnoses and hashing six passwords takes seconds on a busy shared machine.
}, 60_000);
afterAll(() => h.close());

describe('what an apprentice may read', () => {
  it('lists the concluded diagnoses only and cannot open the one still in progress', async () => {
    const list = await get('apprentice', '/api/diagnoses');
    const everyone = (await get('lead', '/api/diagnoses')).body.diagnoses as DiagnosisSummary[];
    expect(list.body.diagnoses.length).toBe(everyone.length - 1);
    expect(new Set(list.body.diagnoses.map((d: DiagnosisSummary) => d.status))).toEqual(new Set(['concluded']));
    expect((await get('apprentice', `/api/diagnoses/${openId}`)).status).toBe(404);
    expect((await get('apprentice', `/api/diagnoses/${openId}/comments`)).status).toBe(404);
  });

  it("sees none of another shop's diagnoses, comments or steps", async () => {
    expect((await get('outsider', '/api/diagnoses')).body.diagnoses).toEqual([]);
    expect((await get('outsider', `/api/diagnoses/${tessa.id}`)).status).toBe(404);
    expect((await get('outsider', `/api/diagnoses/${tessa.id}/comments`)).status).toBe(404);
    const practice = await post('outsider', '/api/practice/attempts', {
      runId: crypto.randomUUID(),
      diagnosisId: tessa.id,
      stepSeq: 1,
      asked: 'next_check',
      answer: 'battery-volts',
    });
    expect(practice.status).toBe(404);
  });
});

describe('comments on steps', () => {
  const path = (d: { id: string }, seq: number) => `/api/diagnoses/${d.id}/steps/${seq}/comments`;

  it('cannot be written by an apprentice or a technician', async () => {
    for (const who of ['apprentice', 'tech']) {
      const res = await post(who, path(tessa, 5), { body: 'Looks fine to me.' });
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('forbidden');
    }
    expect((await get('lead', `/api/diagnoses/${tessa.id}/comments`)).body.comments).toEqual([]);
  });

  it('are written by a lead on one step, once per Idempotency-Key, and read by the apprentice', async () => {
    const seq = seqOf(tessa, 'sensor-resistance');
    const body = { body: 'Marginal on a corroded connector: clean the pins before blaming the coil.' };
    const first = await post('lead', path(tessa, seq), body, 'comment-key-0001');
    const retry = await post('lead', path(tessa, seq), body, 'comment-key-0001');
    expect(first.status).toBe(201);
    expect(retry.headers['idempotent-replayed']).toBe('true');
    expect(first.body.comment).toMatchObject({ stepSeq: seq, author: 'Dario Lindqvist', body: body.body });
    const read = await get('apprentice', `/api/diagnoses/${tessa.id}/comments`);
    expect(read.status).toBe(200);
    expect(read.body.comments).toHaveLength(1);
    expect(read.body.comments[0]).toMatchObject({ id: first.body.comment.id, stepSeq: seq });
  });

  it('may be written on a retracted step by the owner', async () => {
    const res = await post('owner', path(fellrunner, seqOf(fellrunner, 'stator-res-3', true)), { body: 'Read the meter twice before you type.' });
    expect(res.status).toBe(201);
  });

  it('are refused on a diagnosis still open, on a missing step and when empty', async () => {
    expect((await post('lead', path({ id: openId }, 1), { body: 'Too early.' })).body.error.code).toBe('not_concluded');
    expect((await post('lead', path(tessa, 99), { body: 'Nowhere.' })).status).toBe(404);
    expect((await post('lead', path(tessa, 1), { body: '   ' })).status).toBe(400);
  });
});

describe('practice scored by the server', () => {
  const runId = crypto.randomUUID();
  const attempt = (who: string, body: object, key?: string) => post(who, '/api/practice/attempts', { runId, diagnosisId: tessa.id, ...body }, key);

  it('scores a wrong verdict wrong and explains the reading', async () => {
    // Step 5 of the Tessa diagnosis: 0.428 kΩ against 360–440 Ω corrected to 12 °C, too close to call.
    const res = await attempt('apprentice', { stepSeq: seqOf(tessa, 'sensor-resistance'), asked: 'verdict', answer: 'in_spec' }, 'practice-key-0001');
    expect(res.status).toBe(201);
    expect(res.body.attempt).toMatchObject({ correct: false, answer: 'in_spec', expected: 'marginal', checkId: 'sensor-resistance' });
    expect(res.body.expectedLabel).toBe('Marginal');
    expect(res.body.explanation).toMatch(/too close to call/);
  });

  it('never takes the score from the client', async () => {
    const res = await attempt('apprentice', { stepSeq: 1, asked: 'next_check', answer: 'finding-coil', correct: true });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('unknown_field');
  });

  it('scores a right next check right', async () => {
    const res = await attempt('apprentice', { stepSeq: 1, asked: 'next_check', answer: 'battery-volts' });
    expect(res.status).toBe(201);
    expect(res.body.attempt.correct).toBe(true);
    expect(res.body.explanation).toBe('“No spark on either cylinder” leads to “Battery voltage at rest”.');
  });

  it('answers a retry with the same key once, and refuses a second answer to the same question in a pass', async () => {
    const seq = seqOf(tessa, 'sensor-resistance');
    const retry = await attempt('apprentice', { stepSeq: seq, asked: 'verdict', answer: 'in_spec' }, 'practice-key-0001');
    expect(retry.headers['idempotent-replayed']).toBe('true');
    const fishing = await attempt('apprentice', { stepSeq: seq, asked: 'verdict', answer: 'marginal' });
    expect(fishing.status).toBe(409);
    expect(fishing.body.error.code).toBe('already_answered');
  });

  it('refuses answers that are not among the choices and questions a step does not ask', async () => {
    const notChoice = await attempt('apprentice', { stepSeq: 2, asked: 'verdict', answer: 'sideways' });
    expect(notChoice.status).toBe(400);
    expect(notChoice.body.error.code).toBe('not_a_choice');
    const noReading = await attempt('apprentice', { stepSeq: 1, asked: 'verdict', answer: 'in_spec' });
    expect(noReading.status).toBe(409);
    expect(noReading.body.error.code).toBe('no_such_question');
  });

  it('is only for concluded diagnoses', async () => {
    const body = { runId: crypto.randomUUID(), diagnosisId: openId, stepSeq: 1, asked: 'verdict', answer: 'in_spec' };
    expect((await post('apprentice', '/api/practice/attempts', body)).status).toBe(404);
    expect((await post('lead', '/api/practice/attempts', body)).body.error.code).toBe('not_concluded');
  });
});

describe('practice history belongs to its owner', () => {
  const mine = async (who: string, query = '') => (await get(who, `/api/practice/attempts${query}`)).body.attempts as PracticeAttemptView[];

  beforeAll(async () => {
    const res = await post('apprentice2', '/api/practice/attempts', { runId: crypto.randomUUID(), diagnosisId: tessa.id, stepSeq: 2, asked: 'verdict', answer: 'in_spec' });
    expect(res.body.attempt.correct).toBe(true);
  });

  it("an apprentice sees only their own answers, even when asking for someone else's", async () => {
    const first = await mine('apprentice');
    expect(first.length).toBe(2);
    expect(new Set(first.map((a) => a.userName))).toEqual(new Set(['Inès Marchetti']));
    const second = await mine('apprentice2', `?userId=${first[0].userId}`);
    expect(second.map((a) => [a.userName, a.stepSeq, a.correct])).toEqual([['noor', 2, true]]);
  });

  it("a lead and the owner see the team's, and can narrow it to one member", async () => {
    for (const who of ['lead', 'owner']) {
      const team = await mine(who);
      expect(team.map((a) => a.userName).sort()).toEqual(['Inès Marchetti', 'Inès Marchetti', 'noor']);
      expect(team[0]).toMatchObject({ procedureTitle: tessa.procedureTitle, machine: tessa.machine, diagnosisId: tessa.id });
    }
    const ines = (await mine('apprentice'))[0].userId;
    expect((await mine('lead', `?userId=${ines}`)).every((a) => a.userId === ines)).toBe(true);
  });

  it('a technician sees only their own, and another shop sees nothing', async () => {
    expect(await mine('tech')).toEqual([]);
    expect(await mine('outsider')).toEqual([]);
  });
});

describe('insight for leads', () => {
  const path = (d: DiagnosisDetail, n = d.versionNumber) => `/api/procedures/${d.procedureId}/versions/${n}/insight`;

  it('sums the concluded diagnoses of a version, the seeded ones included, and expects within what was seen', async () => {
    const res = await get('lead', path(tessa));
    expect(res.status).toBe(200);
    const insight = res.body.insight;
    const all = (await get('lead', '/api/diagnoses')).body.diagnoses as DiagnosisSummary[];
    const ran = all.filter((d) => d.procedureId === tessa.procedureId && d.versionNumber === tessa.versionNumber && d.status === 'concluded');
    expect(ran.length).toBeGreaterThan(10);
    expect(insight).toMatchObject({ diagnoses: ran.length, versionNumber: 1 });
    expect(insight.findings.reduce((n: number, f: { count: number }) => n + f.count, 0)).toBe(ran.length);
    expect(insight.findings).toContainEqual(expect.objectContaining({ checkId: 'finding-sensor-harness' }));
    expect(insight.edges).toContainEqual(expect.objectContaining({ from: 'sensor-resistance', to: 'sensor-resistance' }));
    // An expectation is a weighted mean over paths like the ones seen, so it lies between the shortest and
    // longest of them, in checks and in time to the last step.
    const details = await Promise.all(ran.map(async (d) => (await get('lead', `/api/diagnoses/${d.id}`)).body.diagnosis as DiagnosisDetail));
    const lengths = details.map((d) => d.steps.filter((s) => !s.retracted).length);
    const minutes = details.map((d) => (Date.parse(d.steps.at(-1)!.recordedAt) - Date.parse(d.startedAt)) / 60_000);
    expect(insight.expected.checks).toBeGreaterThanOrEqual(Math.min(...lengths));
    expect(insight.expected.checks).toBeLessThanOrEqual(Math.max(...lengths));
    expect(insight.expected.ms / 60_000).toBeGreaterThanOrEqual(Math.min(...minutes) * 0.5);
    expect(insight.expected.ms / 60_000).toBeLessThanOrEqual(Math.max(...minutes));
    expect(insight.document.startCheckId).toBe('spark-test');
  });

  it('is for leads and owners of the shop only', async () => {
    expect((await get('owner', path(tessa))).status).toBe(200);
    expect((await get('apprentice', path(tessa))).status).toBe(403);
    expect((await get('outsider', path(tessa))).status).toBe(403);
    expect((await request(h.app).get(path(tessa)).set('authorization', `Bearer ${await h.otherShopToken()}`)).status).toBe(404);
    expect((await get('lead', path(tessa, 99))).status).toBe(404);
  });
});
