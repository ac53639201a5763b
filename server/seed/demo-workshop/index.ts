import crypto from 'node:crypto';
import type { EntityManager, EntityTarget, ObjectLiteral, QueryDeepPartialEntity } from 'typeorm';
import type { Role } from '@shared/auth/roles';
import { DiagnosisStep } from '../../diagnoses/diagnosis-step.entity';
import { Diagnosis } from '../../diagnoses/diagnosis.entity';
import { Job } from '../../jobs/job.entity';
import { Machine } from '../../machines/machine.entity';
import { Meter } from '../../meters/meter.entity';
import { storePhoto } from '../../photos/photo-storage';
import { DiagnosisPhoto } from '../../photos/photo.entity';
import { ProcedureVersion } from '../../procedures/procedure-version.entity';
import { Procedure } from '../../procedures/procedure.entity';
import type { User } from '../../users/user.entity';
import { DEMO_DIAGNOSES, replayDiagnosis } from './diagnoses';
import { generateDemoDiagnoses } from './generate-diagnoses';
import { meterPhotoPng } from './meter-photo';
import { DEMO_JOBS } from './machines-and-jobs';
import { DEMO_METERS } from './meters';
import { DEMO_PROCEDURES } from './procedures';
import { addMinutes, daysBefore, resolveWhen } from './time';

/**
 * The demo shop's workshop content: meters, machines and jobs, five published procedures with a version
 * history and a draft, three hand-written concluded diagnoses and one in progress, and dozens of concluded
 * diagnoses generated from invented faults (generate-diagnoses.ts). Everything is invented for the demo.
 * Runs inside the seed's transaction; a shop that already has procedures is left alone.
 */
export async function seedDemoWorkshop(
  tx: EntityManager,
  shop: { id: string },
  users: Record<Role, User>,
  options: { now?: Date; /** Where photo files go; without it no photos are seeded. */ dataDir?: string } = {},
): Promise<void> {
  const now = options.now ?? new Date();
  const shopId = shop.id;
  if (await tx.getRepository(Procedure).existsBy({ shopId })) return;
  const lead = users.lead;

  const meters = new Map<string, Meter>();
  for (const [i, m] of DEMO_METERS.entries()) {
    const saved = await tx.getRepository(Meter).save({ shopId, name: m.name, model: m.model, ranges: m.ranges, active: true, createdAt: daysBefore(now, 180 - i * 30) });
    meters.set(m.key, saved);
  }

  // Dozens of machines, jobs and diagnoses: built as rows and inserted in bulk, so a first start stays quick.
  const jobs = new Map<string, { id: string; machineId: string }>();
  const generated = generateDemoDiagnoses();
  const machineRows: QueryDeepPartialEntity<Machine>[] = [];
  const jobRows: QueryDeepPartialEntity<Job>[] = [];
  for (const j of [...DEMO_JOBS, ...generated.jobs]) {
    const booked = resolveWhen(now, j.booked);
    const machineId = crypto.randomUUID();
    const jobId = crypto.randomUUID();
    machineRows.push({ id: machineId, shopId, ...j.machine, createdAt: booked });
    jobRows.push({
      id: jobId,
      shopId,
      machineId,
      customerName: j.customerName,
      customerContact: j.customerContact,
      customerEmail: j.customerEmail,
      complaint: j.complaint,
      reference: j.reference,
      createdAt: addMinutes(booked, 2),
    });
    jobs.set(j.key, { id: jobId, machineId });
  }
  await insertInChunks(tx, Machine, machineRows);
  await insertInChunks(tx, Job, jobRows);

  /** The version a new diagnosis would have run on each procedure: its newest published one. */
  const running = new Map<string, ProcedureVersion>();
  /** Every numbered version, by procedure and number, for diagnoses run on an older one. */
  const numbered = new Map<string, ProcedureVersion>();
  for (const p of DEMO_PROCEDURES) {
    const procedure = await tx.getRepository(Procedure).save({
      shopId,
      title: p.title,
      complaint: p.complaint,
      family: p.family,
      createdById: lead.id,
      createdAt: daysBefore(now, p.createdDaysAgo),
    });
    let number = 0;
    for (const v of p.versions) {
      const draft = v.status === 'draft';
      const at = daysBefore(now, v.daysAgo);
      const retiredAt = v.retiredDaysAgo === undefined ? null : daysBefore(now, v.retiredDaysAgo);
      const saved = await tx.getRepository(ProcedureVersion).save({
        shopId,
        procedureId: procedure.id,
        status: v.status,
        number: draft ? null : ++number,
        revision: v.revision ?? 1,
        document: v.document,
        updatedById: lead.id,
        publishedAt: draft ? null : at,
        publishedById: draft ? null : lead.id,
        retiredAt,
        updatedAt: retiredAt ?? at,
      });
      if (v.status === 'published') running.set(p.key, saved);
      if (!draft) numbered.set(`${p.key}#${number}`, saved);
    }
  }

  const diagnosisRows: QueryDeepPartialEntity<Diagnosis>[] = [];
  const stepRows: QueryDeepPartialEntity<DiagnosisStep>[] = [];
  const photoRows: QueryDeepPartialEntity<DiagnosisPhoto>[] = [];
  for (const d of [...DEMO_DIAGNOSES, ...generated.diagnoses]) {
    const version = d.version === undefined ? running.get(d.procedure)! : numbered.get(`${d.procedure}#${d.version}`)!;
    const meter = meters.get(d.meter)!;
    const job = jobs.get(d.job)!;
    const by = users[d.by];
    const replay = replayDiagnosis(version.document, d, meter.ranges);
    const startedAt = resolveWhen(now, d.start);
    const diagnosisId = crypto.randomUUID();
    diagnosisRows.push({
      id: diagnosisId,
      shopId,
      versionId: version.id,
      machineId: job.machineId,
      jobId: job.id,
      meterId: meter.id,
      ambientC: d.ambientC,
      startedById: by.id,
      status: d.conclusion ? 'concluded' : 'open',
      currentCheckId: replay.currentCheckId,
      conclusion: d.conclusion
        ? { findingCheckId: d.conclusion.findingCheckId, note: d.conclusion.note, parts: d.conclusion.parts, labourMinutes: d.conclusion.labourMinutes }
        : null,
      abandonReason: null,
      startedAt,
      endedAt: d.conclusion ? addMinutes(startedAt, d.conclusion.atMin) : null,
    });
    // A few generated diagnoses carry a photo of the meter on the reading that gave the fault away.
    const decisive = replay.steps.filter((s) => s.retractedAtMin === null).at(-1);
    const photographed = options.dataDir !== undefined && d.key.startsWith('generated-') && photoRows.length < PHOTOGRAPHED && decisive?.readingText ? decisive : null;
    for (const s of replay.steps) {
      const stepId = crypto.randomUUID();
      if (s === photographed) {
        const shown = s.overRange ? 'OL' : s.readingText!.replace(',', '.').replace(/[^0-9.-]/g, '');
        const bytes = meterPhotoPng(shown);
        photoRows.push({
          id: crypto.randomUUID(),
          shopId,
          diagnosisId,
          stepId,
          storageKey: await storePhoto(options.dataDir!, shopId, bytes, 'image/png'),
          contentType: 'image/png',
          size: bytes.length,
          uploadedById: by.id,
          createdAt: addMinutes(startedAt, s.atMin + 1),
        });
      }
      stepRows.push({
        id: stepId,
        shopId,
        diagnosisId,
        seq: s.seq,
        checkId: s.checkId,
        readingText: s.readingText,
        valueSi: s.valueSi,
        overRange: s.overRange,
        verdict: s.verdict,
        choiceId: s.choiceId,
        evaluation: s.evaluation,
        nextCheckId: s.nextCheckId,
        note: s.note,
        byId: by.id,
        recordedAt: addMinutes(startedAt, s.atMin),
        retracted: s.retractedAtMin !== null,
        retractedAt: s.retractedAtMin === null ? null : addMinutes(startedAt, s.retractedAtMin),
        idempotencyKey: null,
      });
    }
  }
  await insertInChunks(tx, Diagnosis, diagnosisRows);
  await insertInChunks(tx, DiagnosisStep, stepRows);
  await insertInChunks(tx, DiagnosisPhoto, photoRows);
}

/** How many generated diagnoses get a photo. */
const PHOTOGRAPHED = 3;

/** SQLite limits the variables of one statement, so rows go in a few hundred at a time. */
async function insertInChunks<T extends ObjectLiteral>(tx: EntityManager, entity: EntityTarget<T>, rows: QueryDeepPartialEntity<T>[]): Promise<void> {
  for (let i = 0; i < rows.length; i += 40) await tx.getRepository(entity).insert(rows.slice(i, i + 40));
}
