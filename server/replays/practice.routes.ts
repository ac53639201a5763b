import type { EntityManager, FindOptionsWhere } from 'typeorm';
import type { PracticeAttemptView, PracticeResult } from '@shared/api/replay-types';
import { practiceAttemptSchema, type PracticeAttemptInput } from '@shared/practice/schemas';
import { scorePracticeAnswer } from '@shared/practice/questions';
import { ApiError } from '../http/api-error';
import type { RouteDef } from '../http/route';
import { answerOnce } from '../idempotency/with-idempotency';
import type { Machine } from '../machines/machine.entity';
import type { Procedure } from '../procedures/procedure.entity';
import type { User } from '../users/user.entity';
import { PracticeAttempt } from './practice-attempt.entity';
import { readableDiagnosis, requireConcluded, stepOf } from './replayable';

/** Leads and owners follow the whole team's practice; everyone else sees their own. */
const TEAM_VIEWERS = new Set(['owner', 'lead']);
const RELATIONS = { user: true, diagnosis: { version: { procedure: true }, machine: true } } as const;

type LoadedAttempt = PracticeAttempt & {
  user: User;
  diagnosis: { version: { procedure: Procedure }; machine: Machine };
};

const toView = (a: LoadedAttempt): PracticeAttemptView => ({
  id: a.id,
  runId: a.runId,
  diagnosisId: a.diagnosisId,
  stepSeq: a.stepSeq,
  checkId: a.checkId,
  asked: a.asked,
  answer: a.answer,
  correct: a.correct,
  expected: a.expected,
  userId: a.userId,
  userName: a.user.name,
  procedureTitle: a.diagnosis.version.procedure.title,
  machine: `${a.diagnosis.machine.year} ${a.diagnosis.machine.make} ${a.diagnosis.machine.model}`,
  createdAt: a.createdAt.toISOString(),
});

async function loadAttempt(m: EntityManager, id: string): Promise<LoadedAttempt> {
  return (await m.getRepository(PracticeAttempt).findOneOrFail({ where: { id }, relations: RELATIONS })) as LoadedAttempt;
}

export const practiceRoutes: RouteDef[] = [
  {
    method: 'get',
    path: '/api/practice/attempts',
    summary: "Practice answers, newest first: an apprentice or technician sees their own, a lead or owner the team's (?userId= narrows it). ?diagnosisId= keeps one replay.",
    roles: ['owner', 'lead', 'tech', 'apprentice'],
    async handler(req, res, ctx) {
      const where: FindOptionsWhere<PracticeAttempt> = { shopId: req.member.shopId };
      if (!TEAM_VIEWERS.has(req.member.role)) where.userId = req.member.id;
      else if (typeof req.query.userId === 'string') where.userId = req.query.userId;
      if (typeof req.query.diagnosisId === 'string') where.diagnosisId = req.query.diagnosisId;
      const attempts = await ctx.ds.getRepository(PracticeAttempt).find({ where, relations: RELATIONS, order: { createdAt: 'DESC' }, take: 1000 });
      res.json({ attempts: (attempts as LoadedAttempt[]).map(toView) });
    },
  },
  {
    method: 'post',
    path: '/api/practice/attempts',
    summary: 'Answer a practice question on one step of a concluded diagnosis; the server scores it from the recorded step and keeps it. Honours Idempotency-Key.',
    roles: ['owner', 'lead', 'tech', 'apprentice'],
    body: practiceAttemptSchema,
    async handler(req, res, ctx) {
      const input = req.body as PracticeAttemptInput;
      await answerOnce(ctx, req, res, async (tx) => {
        const d = await readableDiagnosis(tx, req.member, input.diagnosisId);
        requireConcluded(d, 'Practice questions');
        const step = await stepOf(tx, d.id, input.stepSeq);
        const score = scorePracticeAnswer(d.version.document, step, input.asked, input.answer);
        if (!score.ok) throw new ApiError(score.status, score.code, score.message, score.status === 400 ? { answer: score.message } : undefined);
        const repo = tx.getRepository(PracticeAttempt);
        if (await repo.existsBy({ userId: req.member.id, runId: input.runId, stepSeq: step.seq, asked: input.asked })) {
          throw new ApiError(409, 'already_answered', 'This question was already answered in this practice pass. Start a new pass to try again.');
        }
        const saved = await repo.save({
          shopId: req.member.shopId,
          userId: req.member.id,
          runId: input.runId,
          diagnosisId: d.id,
          stepSeq: step.seq,
          checkId: step.checkId,
          asked: input.asked,
          answer: input.answer,
          expected: score.expected,
          correct: score.correct,
          createdAt: new Date(),
        });
        const result: PracticeResult = { attempt: toView(await loadAttempt(tx, saved.id)), expectedLabel: score.expectedLabel, explanation: score.explanation };
        return { status: 201, body: result };
      });
    },
  },
];
