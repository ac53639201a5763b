import { jobSchema, type JobInput } from '@shared/workshop/schemas';
import type { JobListItem, JobView } from '@shared/api/workshop-types';
import { dateFromSql } from '../db/sql-values';
import { Diagnosis } from '../diagnoses/diagnosis.entity';
import { ApiError, notFound } from '../http/api-error';
import type { RouteDef } from '../http/route';
import { answerOnce } from '../idempotency/with-idempotency';
import { Machine } from '../machines/machine.entity';
import { toMachineView } from '../machines/machines.routes';
import { Job } from './job.entity';

const RUNNERS = ['owner', 'lead', 'tech'] as const;

export const toJobView = (j: Job & { machine: Machine }): JobView => ({
  id: j.id,
  reference: j.reference,
  customerName: j.customerName,
  customerContact: j.customerContact,
  customerEmail: j.customerEmail,
  complaint: j.complaint,
  machine: toMachineView(j.machine),
  createdAt: j.createdAt.toISOString(),
});

export const jobRoutes: RouteDef[] = [
  {
    method: 'get',
    path: '/api/jobs',
    summary: "The shop's jobs with their machines, newest first, each with when its latest concluded diagnosis ended (null while none has).",
    roles: RUNNERS,
    async handler(req, res, ctx) {
      const shopId = req.member.shopId;
      const [jobs, concluded] = await Promise.all([
        ctx.ds.getRepository(Job).find({ where: { shopId }, relations: { machine: true }, order: { createdAt: 'DESC' }, take: 500 }),
        ctx.ds
          .getRepository(Diagnosis)
          .createQueryBuilder('d')
          .select('d.jobId', 'jobId')
          .addSelect('MAX(d.endedAt)', 'endedAt')
          .where('d.shopId = :shopId AND d.status = :status', { shopId, status: 'concluded' })
          .groupBy('d.jobId')
          .getRawMany<{ jobId: string; endedAt: string }>(),
      ]);
      const endedAt = new Map(concluded.map((c) => [c.jobId, dateFromSql(c.endedAt).toISOString()]));
      const list: JobListItem[] = jobs.map((j) => ({ ...toJobView(j), concludedAt: endedAt.get(j.id) ?? null }));
      res.json({ jobs: list });
    },
  },
  {
    method: 'post',
    path: '/api/jobs',
    summary: 'Open a job: customer, complaint in their words, machine. Honours Idempotency-Key.',
    roles: RUNNERS,
    body: jobSchema,
    async handler(req, res, ctx) {
      const input = req.body as JobInput;
      const shopId = req.member.shopId;
      await answerOnce(ctx, req, res, async (tx) => {
        const machine = await tx.getRepository(Machine).findOneBy({ id: input.machineId, shopId });
        if (!machine) throw new ApiError(404, 'not_found', 'No machine with that id in your shop.', { machineId: 'Pick a machine of your shop.' });
        const saved = await tx.getRepository(Job).save({ ...input, shopId });
        return { status: 201, body: { job: toJobView({ ...saved, machine }) } };
      });
    },
  },
  {
    method: 'get',
    path: '/api/jobs/:id',
    summary: 'One job with its machine.',
    roles: RUNNERS,
    async handler(req, res, ctx) {
      const j = await ctx.ds.getRepository(Job).findOne({ where: { id: String(req.params.id), shopId: req.member.shopId }, relations: { machine: true } });
      if (!j) throw notFound('job');
      res.json({ job: toJobView(j) });
    },
  },
];
