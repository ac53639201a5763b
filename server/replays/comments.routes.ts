import type { StepCommentView } from '@shared/api/replay-types';
import { stepCommentSchema, type StepCommentInput } from '@shared/practice/schemas';
import type { RouteDef } from '../http/route';
import { answerOnce } from '../idempotency/with-idempotency';
import { readableDiagnosis, requireConcluded, stepOf } from './replayable';
import { StepComment } from './step-comment.entity';

const toView = (c: StepComment, author: string): StepCommentView => ({
  id: c.id,
  diagnosisId: c.diagnosisId,
  stepSeq: c.stepSeq,
  body: c.body,
  author,
  createdAt: c.createdAt.toISOString(),
});

export const commentRoutes: RouteDef[] = [
  {
    method: 'get',
    path: '/api/diagnoses/:id/comments',
    summary: 'Comments on the steps of a diagnosis, oldest first; readable by whoever may read the diagnosis.',
    roles: ['owner', 'lead', 'tech', 'apprentice'],
    async handler(req, res, ctx) {
      const d = await readableDiagnosis(ctx.ds.manager, req.member, String(req.params.id));
      const comments = await ctx.ds.getRepository(StepComment).find({
        where: { diagnosisId: d.id, shopId: req.member.shopId },
        relations: { author: true },
        order: { createdAt: 'ASC' },
      });
      res.json({ comments: comments.map((c) => toView(c, c.author.name)) });
    },
  },
  {
    method: 'post',
    path: '/api/diagnoses/:id/steps/:seq/comments',
    summary: 'A lead or owner comments on one step of a concluded diagnosis. Honours Idempotency-Key.',
    roles: ['owner', 'lead'],
    body: stepCommentSchema,
    async handler(req, res, ctx) {
      const { body } = req.body as StepCommentInput;
      await answerOnce(ctx, req, res, async (tx) => {
        const d = await readableDiagnosis(tx, req.member, String(req.params.id));
        requireConcluded(d, 'Comments');
        const step = await stepOf(tx, d.id, req.params.seq);
        const saved = await tx.getRepository(StepComment).save({
          shopId: req.member.shopId,
          diagnosisId: d.id,
          stepSeq: step.seq,
          authorId: req.member.id,
          body,
          createdAt: new Date(),
        });
        return { status: 201, body: { comment: toView(saved, req.member.name) } };
      });
    },
  },
];
