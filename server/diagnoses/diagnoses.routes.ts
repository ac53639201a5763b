import type { EntityManager } from 'typeorm';
import type { DiagnosisSummary, StepAnswer } from '@shared/api/diagnosis-types';
import { decideStep } from '@shared/diagnosis/decide-step';
import { abandonSchema, concludeSchema, startDiagnosisSchema, submitStepSchema } from '@shared/diagnosis/schemas';
import type { ConcludeInput, StartDiagnosisInput, SubmitStepInput } from '@shared/diagnosis/schemas';
import { ApiError, notFound } from '../http/api-error';
import type { AuthedRequest, RouteDef } from '../http/route';
import { answerOnce, answerOnceSync } from '../idempotency/with-idempotency';
import { Job } from '../jobs/job.entity';
import { Meter } from '../meters/meter.entity';
import { DiagnosisPhoto } from '../photos/photo.entity';
import { ProcedureVersion } from '../procedures/procedure-version.entity';
import { Procedure } from '../procedures/procedure.entity';
import { DiagnosisStep } from './diagnosis-step.entity';
import { Diagnosis } from './diagnosis.entity';
import { stepStoreOf, type NewStep } from './step-store';
import { toDetail, toSummary, type LoadedDiagnosis } from './diagnosis-views';

const RUNNERS = ['owner', 'lead', 'tech'] as const;
const EVERYONE = ['owner', 'lead', 'tech', 'apprentice'] as const;
const STATUSES = new Set(['open', 'concluded', 'abandoned']);
const RELATIONS = { version: { procedure: true }, machine: true, job: true, meter: true, startedBy: true } as const;

/** Apprentices learn from concluded diagnoses only; everything else is shop-wide for the other roles. */
export async function loadDiagnosis(m: EntityManager, req: AuthedRequest): Promise<LoadedDiagnosis> {
  const d = await m.getRepository(Diagnosis).findOne({ where: { id: String(req.params.id), shopId: req.member.shopId }, relations: RELATIONS });
  if (!d || (req.member.role === 'apprentice' && d.status !== 'concluded')) throw notFound('diagnosis');
  return d as LoadedDiagnosis;
}

function requireOpen(d: { status: string }) {
  if (d.status !== 'open') throw new ApiError(409, 'diagnosis_closed', `This diagnosis is ${d.status}; it takes no more steps.`);
}

export async function stepsOf(m: EntityManager, diagnosisId: string) {
  return m.getRepository(DiagnosisStep).find({ where: { diagnosisId }, relations: { by: true }, order: { seq: 'ASC' } });
}

export async function photosOf(m: EntityManager, diagnosisId: string) {
  return m.getRepository(DiagnosisPhoto).find({ where: { diagnosisId }, order: { createdAt: 'ASC' } });
}

export const diagnosisRoutes: RouteDef[] = [
  {
    method: 'get',
    path: '/api/diagnoses',
    summary: 'Diagnoses of the shop, newest first; ?status=open|concluded|abandoned. Apprentices see concluded ones only.',
    roles: EVERYONE,
    async handler(req, res, ctx) {
      const asked = typeof req.query.status === 'string' ? req.query.status : undefined;
      if (asked !== undefined && !STATUSES.has(asked)) throw new ApiError(400, 'invalid_input', 'status is open, concluded or abandoned.');
      const status = req.member.role === 'apprentice' ? 'concluded' : asked;
      const list = await ctx.ds.getRepository(Diagnosis).find({
        where: { shopId: req.member.shopId, ...(status ? { status: status as Diagnosis['status'] } : {}) },
        relations: RELATIONS,
        order: { startedAt: 'DESC' },
        take: 200,
      });
      const counts = new Map<string, number>();
      if (list.length) {
        const rows: { diagnosisId: string; n: number }[] = await ctx.ds
          .getRepository(DiagnosisStep)
          .createQueryBuilder('s')
          .select('s.diagnosisId', 'diagnosisId')
          .addSelect('COUNT(*)', 'n')
          .where('s.diagnosisId IN (:...ids) AND s.retracted = 0', { ids: list.map((d) => d.id) })
          .groupBy('s.diagnosisId')
          .getRawMany();
        for (const r of rows) counts.set(r.diagnosisId, Number(r.n));
      }
      const diagnoses: DiagnosisSummary[] = list.map((d) => toSummary(d as LoadedDiagnosis, counts.get(d.id) ?? 0));
      res.json({ diagnoses });
    },
  },
  {
    method: 'post',
    path: '/api/diagnoses',
    summary: 'Start a diagnosis on a published version for a job, with the meter in hand and the ambient temperature. Honours Idempotency-Key.',
    roles: RUNNERS,
    body: startDiagnosisSchema,
    async handler(req, res, ctx) {
      const input = req.body as StartDiagnosisInput;
      const shopId = req.member.shopId;
      await answerOnce(ctx, req, res, async (tx) => {
        const procedure = await tx.getRepository(Procedure).findOneBy({ id: input.procedureId, shopId });
        if (!procedure) throw notFound('procedure');
        const versions = tx.getRepository(ProcedureVersion);
        const version = input.versionNumber
          ? await versions.findOneBy({ procedureId: procedure.id, number: input.versionNumber })
          : await versions.findOne({ where: { procedureId: procedure.id, status: 'published' }, order: { number: 'DESC' } });
        if (!version) throw new ApiError(409, 'not_published', 'This procedure has no published version to run yet.');
        if (version.status !== 'published') throw new ApiError(409, 'version_retired', `Version ${version.number} is ${version.status}; start the newest published version instead.`);
        const job = await tx.getRepository(Job).findOneBy({ id: input.jobId, shopId });
        if (!job) throw notFound('job');
        const meter = await tx.getRepository(Meter).findOneBy({ id: input.meterId, shopId });
        if (!meter) throw notFound('meter');
        const saved = await tx.getRepository(Diagnosis).save({
          shopId,
          versionId: version.id,
          machineId: job.machineId,
          jobId: job.id,
          meterId: meter.id,
          ambientC: input.ambientC,
          startedById: req.member.id,
          status: 'open',
          currentCheckId: version.document.startCheckId,
          conclusion: null,
          abandonReason: null,
          startedAt: new Date(),
          endedAt: null,
        });
        const loaded = await tx.getRepository(Diagnosis).findOneOrFail({ where: { id: saved.id }, relations: RELATIONS });
        return { status: 201, body: { diagnosis: toDetail(loaded as LoadedDiagnosis, [], []) } };
      });
    },
  },
  {
    method: 'get',
    path: '/api/diagnoses/:id',
    summary: 'A diagnosis with its pinned procedure, every step (retracted ones included) and the current check.',
    roles: EVERYONE,
    async handler(req, res, ctx) {
      const d = await loadDiagnosis(ctx.ds.manager, req);
      res.json({ diagnosis: toDetail(d, await stepsOf(ctx.ds.manager, d.id), await photosOf(ctx.ds.manager, d.id)) });
    },
  },
  {
    method: 'post',
    path: '/api/diagnoses/:id/steps',
    summary: 'Submit the reading, observation or "done" for the current check. The server parses and judges it itself, records the step and answers the verdict and the next check. Honours Idempotency-Key.',
    roles: RUNNERS,
    body: submitStepSchema,
    async handler(req, res, ctx) {
      const input = req.body as SubmitStepInput;
      const store = stepStoreOf(ctx.ds);
      await answerOnceSync(ctx, req, res, () => {
        const d = store.diagnosis(String(req.params.id), req.member.shopId);
        if (!d) throw notFound('diagnosis');
        requireOpen(d);
        if (input.checkId !== d.currentCheckId) {
          throw new ApiError(409, 'not_current_check', 'The diagnosis has moved on from that check. Reload to see where it stands.', undefined, { currentCheckId: d.currentCheckId });
        }
        const { lastSeq, path } = store.steps(d.id);
        const decision = decideStep(store.document(d.versionId), input.checkId, { reading: input.reading, choiceId: input.choiceId }, {
          meterRanges: d.meterRanges,
          ambientC: d.ambientC,
          path,
        });
        if (!decision.ok) throw new ApiError(400, decision.code, decision.message, { [decision.field]: decision.message });
        const step: NewStep = {
          shopId: d.shopId,
          diagnosisId: d.id,
          seq: lastSeq + 1,
          checkId: input.checkId,
          readingText: input.reading ?? null,
          valueSi: decision.value,
          overRange: decision.overRange,
          verdict: decision.verdict,
          choiceId: decision.choiceId,
          evaluation: decision.evaluation,
          nextCheckId: decision.nextCheckId,
          note: input.note,
          byId: req.member.id,
          recordedAt: new Date(),
          idempotencyKey: req.get('idempotency-key') ?? null,
        };
        const id = store.record(step);
        const answer: StepAnswer = {
          step: { ...step, id, by: req.member.name, recordedAt: step.recordedAt.toISOString(), retracted: false, retractedAt: null },
          currentCheckId: decision.nextCheckId,
        };
        return { status: 201, body: answer };
      });
    },
  },
  {
    method: 'post',
    path: '/api/diagnoses/:id/back',
    summary: 'Step back: the last step is marked retracted (kept, never deleted) and its check becomes current again. Honours Idempotency-Key.',
    roles: RUNNERS,
    async handler(req, res, ctx) {
      await answerOnce(ctx, req, res, async (tx) => {
        const d = await loadDiagnosis(tx, req);
        requireOpen(d);
        const last = await tx.getRepository(DiagnosisStep).findOne({ where: { diagnosisId: d.id, retracted: false }, order: { seq: 'DESC' } });
        if (!last) throw new ApiError(409, 'nothing_to_retract', 'This is the first check; there is no step to go back from.');
        await tx.getRepository(DiagnosisStep).update({ id: last.id }, { retracted: true, retractedAt: new Date() });
        await tx.getRepository(Diagnosis).update({ id: d.id }, { currentCheckId: last.checkId });
        return { status: 200, body: { retractedSeq: last.seq, currentCheckId: last.checkId } };
      });
    },
  },
  {
    method: 'post',
    path: '/api/diagnoses/:id/conclude',
    summary: 'Conclude at the finding the path reached, with the closing note, parts and labour. Honours Idempotency-Key.',
    roles: RUNNERS,
    body: concludeSchema,
    async handler(req, res, ctx) {
      const input = req.body as ConcludeInput;
      await answerOnce(ctx, req, res, async (tx) => {
        const d = await loadDiagnosis(tx, req);
        requireOpen(d);
        const check = d.version.document.checks.find((c) => c.id === d.currentCheckId);
        if (check?.kind !== 'finding') throw new ApiError(409, 'not_at_finding', 'The path has not reached a finding yet. Finish the current check first.');
        const conclusion = { findingCheckId: check.id, note: input.note, parts: input.parts, labourMinutes: input.labourMinutes };
        await tx.getRepository(Diagnosis).update({ id: d.id }, { status: 'concluded', conclusion, endedAt: new Date() });
        return { status: 200, body: { status: 'concluded', conclusion } };
      });
    },
  },
  {
    method: 'post',
    path: '/api/diagnoses/:id/abandon',
    summary: 'Stop a diagnosis without a finding, with the reason. Its steps are kept. Honours Idempotency-Key.',
    roles: RUNNERS,
    body: abandonSchema,
    async handler(req, res, ctx) {
      const { reason } = req.body as { reason: string };
      await answerOnce(ctx, req, res, async (tx) => {
        const d = await loadDiagnosis(tx, req);
        requireOpen(d);
        await tx.getRepository(Diagnosis).update({ id: d.id }, { status: 'abandoned', abandonReason: reason, endedAt: new Date() });
        return { status: 200, body: { status: 'abandoned' } };
      });
    },
  },
];

