import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { decideStep } from '@shared/diagnosis/decide-step';
import { pathSoFar, type RecordedStep } from '@shared/diagnosis/path-so-far';
import { openDatabase } from '@server/db/data-source';
import { DiagnosisStep } from '@server/diagnoses/diagnosis-step.entity';
import { Diagnosis } from '@server/diagnoses/diagnosis.entity';
import { Job } from '@server/jobs/job.entity';
import { Machine } from '@server/machines/machine.entity';
import { Meter } from '@server/meters/meter.entity';
import { ProcedureVersion } from '@server/procedures/procedure-version.entity';
import { Procedure } from '@server/procedures/procedure.entity';
import { seedDemoWorkshop } from '@server/seed/demo-workshop';
import { generateDemoDiagnoses } from '@server/seed/demo-workshop/generate-diagnoses';
import { seedDemo } from '@server/seed/seed-demo';
import { Shop } from '@server/shops/shop.entity';
import { photoFile } from '@server/photos/photo-storage';
import { DiagnosisPhoto } from '@server/photos/photo.entity';
import { User } from '@server/users/user.entity';
import type { Role } from '@shared/auth/roles';
import { createHarness, type Harness } from '../support/api-harness';

/** The demo shop seeded into a fresh database: what it holds, that it holds it once, and that it is true to the engine. */

let dir: string;
let ds: DataSource;
let seededAt: Date;

const counts = async () => ({
  shops: await ds.getRepository(Shop).count(),
  users: await ds.getRepository(User).count(),
  meters: await ds.getRepository(Meter).count(),
  machines: await ds.getRepository(Machine).count(),
  jobs: await ds.getRepository(Job).count(),
  procedures: await ds.getRepository(Procedure).count(),
  versions: await ds.getRepository(ProcedureVersion).count(),
  diagnoses: await ds.getRepository(Diagnosis).count(),
  steps: await ds.getRepository(DiagnosisStep).count(),
});

beforeAll(async () => {
  dir = fs.mkdtempSync(path.join(os.tmpdir(), 'probepath-demo-seed-'));
  ds = await openDatabase(path.join(dir, 'demo.sqlite'));
  seededAt = new Date();
  expect(await seedDemo(ds, { dataDir: dir })).toBe(true);
}, 60_000);

afterAll(async () => {
  await ds.destroy();
  fs.rmSync(dir, { recursive: true, force: true });
});

describe('seeding the demo shop', () => {
  it('creates the shop, its meters, machines, jobs and procedures', async () => {
    const c = await counts();
    expect(c.shops).toBe(1);
    expect(c.users).toBe(4);
    expect(c.meters).toBeGreaterThanOrEqual(2);
    expect(c.machines).toBeGreaterThanOrEqual(6);
    expect(c.jobs).toBe(c.machines);
    expect(c.procedures).toBeGreaterThanOrEqual(5);
  });

  it('publishes at least five procedures and keeps a version history with a retired version and a draft', async () => {
    const versions = await ds.getRepository(ProcedureVersion).find();
    const publishedProcedures = new Set(versions.filter((v) => v.status === 'published').map((v) => v.procedureId));
    expect(publishedProcedures.size).toBeGreaterThanOrEqual(5);
    const retired = versions.filter((v) => v.status === 'retired');
    expect(retired.length).toBe(1);
    const successor = versions.find((v) => v.procedureId === retired[0].procedureId && v.status === 'published');
    expect(retired[0].number).toBe(1);
    expect(successor?.number).toBe(2);
    expect(retired[0].retiredAt!.getTime()).toBeLessThanOrEqual(successor!.publishedAt!.getTime());
    const drafts = versions.filter((v) => v.status === 'draft');
    expect(drafts.length).toBe(1);
    expect(drafts[0].number).toBeNull();
    expect(drafts[0].revision).toBeGreaterThan(1);
    expect(versions.filter((v) => v.procedureId === drafts[0].procedureId && v.status === 'published').length).toBe(1);
  });

  it('has the hand-written and generated concluded diagnoses, one open, and a few retracted steps', async () => {
    const diagnoses = await ds.getRepository(Diagnosis).find();
    const generated = generateDemoDiagnoses();
    expect(diagnoses.filter((d) => d.status === 'concluded').length).toBe(3 + generated.diagnoses.length);
    expect(diagnoses.filter((d) => d.status === 'open').length).toBe(1);
    const retracted = 1 + generated.diagnoses.reduce((n, d) => n + d.steps.filter((s) => s.retractedAtMin !== undefined).length, 0);
    expect(await ds.getRepository(DiagnosisStep).countBy({ retracted: true })).toBe(retracted);
    expect(retracted).toBeGreaterThanOrEqual(4);
    for (const d of diagnoses.filter((x) => x.status === 'concluded')) {
      expect(d.conclusion?.findingCheckId).toBe(d.currentCheckId);
      expect(d.conclusion?.labourMinutes).toBeGreaterThan(0);
      expect(d.endedAt!.getTime()).toBeGreaterThan(d.startedAt.getTime());
    }
  });

  it('dates everything in the past, over six weeks, and never has one person on two diagnoses at once', async () => {
    const diagnoses = await ds.getRepository(Diagnosis).find({ order: { startedAt: 'ASC' } });
    const concluded = diagnoses.filter((d) => d.status === 'concluded');
    expect(seededAt.getTime() - concluded[0].startedAt.getTime()).toBeGreaterThan(35 * 24 * 3600_000);
    expect(seededAt.getTime() - concluded.at(-1)!.startedAt.getTime()).toBeLessThan(7 * 24 * 3600_000);
    for (const a of diagnoses) {
      for (const b of diagnoses) {
        if (a === b || a.startedById !== b.startedById) continue;
        const aEnd = (a.endedAt ?? seededAt).getTime();
        const bEnd = (b.endedAt ?? seededAt).getTime();
        expect(aEnd <= b.startedAt.getTime() || bEnd <= a.startedAt.getTime(), `${a.id} and ${b.id}`).toBe(true);
      }
    }
    const steps = await ds.getRepository(DiagnosisStep).find();
    for (const s of steps) expect(s.recordedAt.getTime()).toBeLessThan(seededAt.getTime());
    for (const d of diagnoses) expect((d.endedAt ?? d.startedAt).getTime()).toBeLessThan(seededAt.getTime());
    const procedures = await ds.getRepository(Procedure).find();
    for (const p of procedures) expect(p.createdAt.getTime()).toBeLessThan(concluded[0].startedAt.getTime());
  });

  it('runs each diagnosis on a version that was published, and not yet retired, when it started', async () => {
    const diagnoses = await ds.getRepository(Diagnosis).find({ relations: { version: true } });
    for (const d of diagnoses) {
      expect(d.version.publishedAt!.getTime()).toBeLessThanOrEqual(d.startedAt.getTime());
      if (d.version.retiredAt) expect(d.version.retiredAt.getTime()).toBeGreaterThan(d.startedAt.getTime());
    }
    expect(diagnoses.filter((d) => d.version.status === 'retired').length).toBeGreaterThan(0);
  });

  it('stores every step exactly as decideStep decides it, replayed from the stored readings', async () => {
    const diagnoses = await ds.getRepository(Diagnosis).find({ relations: { version: true, meter: true } });
    for (const d of diagnoses) {
      const steps = await ds.getRepository(DiagnosisStep).find({ where: { diagnosisId: d.id }, order: { seq: 'ASC' } });
      const recorded: RecordedStep[] = [];
      let current = d.version.document.startCheckId;
      steps.forEach((s, i) => expect(s.seq).toBe(i + 1));
      for (const s of steps) {
        expect(s.checkId).toBe(current);
        const decision = decideStep(d.version.document, s.checkId, { reading: s.readingText ?? undefined, choiceId: s.choiceId ?? undefined }, {
          meterRanges: d.meter.ranges,
          ambientC: d.ambientC,
          path: pathSoFar(recorded),
        });
        if (!decision.ok) throw new Error(decision.message);
        expect({ verdict: s.verdict, valueSi: s.valueSi, overRange: s.overRange, choiceId: s.choiceId, nextCheckId: s.nextCheckId, evaluation: s.evaluation }).toEqual({
          verdict: decision.verdict,
          valueSi: decision.value,
          overRange: decision.overRange,
          choiceId: decision.choiceId,
          nextCheckId: decision.nextCheckId,
          evaluation: decision.evaluation,
        });
        recorded.push(s);
        if (!s.retracted) current = s.nextCheckId!;
      }
      expect(current).toBe(d.currentCheckId);
      const reached = d.version.document.checks.find((c) => c.id === current)!;
      expect(reached.kind === 'finding').toBe(d.status === 'concluded');
    }
  });

  it('gives a few generated diagnoses a drawn PNG of the meter on the reading that decided them', async () => {
    const photos = await ds.getRepository(DiagnosisPhoto).find();
    expect(photos.length).toBe(3);
    for (const p of photos) {
      const step = await ds.getRepository(DiagnosisStep).findOneByOrFail({ id: p.stepId! });
      const diagnosis = await ds.getRepository(Diagnosis).findOneByOrFail({ id: p.diagnosisId });
      expect(step.nextCheckId).toBe(diagnosis.conclusion?.findingCheckId);
      expect(step.readingText).not.toBeNull();
      const bytes = fs.readFileSync(photoFile(dir, p.shopId, p.storageKey));
      expect(bytes.length).toBe(p.size);
      // The PNG signature (ISO/IEC 15948).
      expect([...bytes.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
      expect(p.contentType).toBe('image/png');
    }
  });

  it('does not duplicate anything when seeded again', async () => {
    const before = await counts();
    expect(await seedDemo(ds)).toBe(false);
    const shop = await ds.getRepository(Shop).findOneByOrFail({});
    const users = Object.fromEntries((await ds.getRepository(User).findBy({ shopId: shop.id })).map((u) => [u.role, u])) as Record<Role, User>;
    await ds.transaction((tx) => seedDemoWorkshop(tx, shop, users));
    expect(await counts()).toEqual(before);
  });
});

describe('the demo shop through the API', () => {
  let h: Harness;
  beforeAll(async () => {
    h = await createHarness({ demoWorkshop: true });
  }, 60_000);
  afterAll(() => h.close());

  it('shows a technician the published procedures and an apprentice the concluded diagnoses', async () => {
    const tech = await h.tokenFor('tech');
    const procedures = await request(h.app).get('/api/procedures').set('authorization', `Bearer ${tech}`);
    expect(procedures.status).toBe(200);
    expect(procedures.body.procedures.length).toBeGreaterThanOrEqual(5);
    const apprentice = await h.tokenFor('apprentice');
    const replays = await request(h.app).get('/api/diagnoses').set('authorization', `Bearer ${apprentice}`);
    expect(replays.status).toBe(200);
    expect(replays.body.diagnoses.length).toBe(3 + generateDemoDiagnoses().diagnoses.length);
    const detail = await request(h.app).get(`/api/diagnoses/${replays.body.diagnoses[0].id}`).set('authorization', `Bearer ${apprentice}`);
    expect(detail.status).toBe(200);
    // The seeded step photos are the apprentice's to see, as photos of concluded diagnoses are.
    const photographed = await h.runtime.ctx.ds.getRepository(DiagnosisPhoto).findOneByOrFail({});
    const photo = await request(h.app).get(`/api/photos/${photographed.id}`).set('authorization', `Bearer ${apprentice}`);
    expect(photo.status).toBe(200);
    expect(photo.headers['content-type']).toBe('image/png');
  });

  it('lists each job with when its latest concluded diagnosis ended, and null for a job still waiting', async () => {
    const tech = await h.tokenFor('tech');
    const res = await request(h.app).get('/api/jobs').set('authorization', `Bearer ${tech}`);
    expect(res.status).toBe(200);
    const { jobs } = res.body as { jobs: { id: string; concludedAt: string | null }[] };
    const diagnoses = await h.runtime.ctx.ds.getRepository(Diagnosis).find({ where: { status: 'concluded' } });
    const latest = new Map<string, number>();
    for (const d of diagnoses) latest.set(d.jobId, Math.max(latest.get(d.jobId) ?? 0, d.endedAt!.getTime()));
    expect(jobs.filter((j) => j.concludedAt).length).toBe(latest.size);
    for (const j of jobs) expect(j.concludedAt ? Date.parse(j.concludedAt) : null, j.id).toBe(latest.get(j.id) ?? null);
    // The open diagnosis's job has no finding yet.
    const open = await request(h.app).get('/api/diagnoses?status=open').set('authorization', `Bearer ${tech}`);
    const openJob = (await h.runtime.ctx.ds.getRepository(Diagnosis).findOneByOrFail({ id: open.body.diagnoses[0].id })).jobId;
    expect(jobs.find((j) => j.id === openJob)?.concludedAt).toBeNull();
  });

  it('lets the technician carry on with the open diagnosis', async () => {
    const tech = await h.tokenFor('tech');
    const open = await request(h.app).get('/api/diagnoses?status=open').set('authorization', `Bearer ${tech}`);
    expect(open.body.diagnoses.length).toBe(1);
    const d = open.body.diagnoses[0];
    const res = await request(h.app)
      .post(`/api/diagnoses/${d.id}/steps`)
      .set('authorization', `Bearer ${tech}`)
      .send({ checkId: d.currentCheckId, reading: 'OL', note: 'Switch reads open with the stand up.' });
    expect(res.status).toBe(201);
    expect(res.body.step.verdict).toBe('open');
    expect(res.body.step.seq).toBe(5);
    expect(res.body.currentCheckId).toBe('finding-sidestand-switch');
  });
});
