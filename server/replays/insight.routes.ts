import { In } from 'typeorm';
import type { VersionInsight } from '@shared/api/replay-types';
import { procedureInsight } from '@shared/insight/procedure-insight';
import { DiagnosisStep } from '../diagnoses/diagnosis-step.entity';
import { Diagnosis } from '../diagnoses/diagnosis.entity';
import { notFound } from '../http/api-error';
import type { RouteDef } from '../http/route';
import { ProcedureVersion } from '../procedures/procedure-version.entity';
import { Procedure } from '../procedures/procedure.entity';

export const insightRoutes: RouteDef[] = [
  {
    method: 'get',
    path: '/api/procedures/:id/versions/:number/insight',
    summary: 'What the concluded diagnoses of one published or retired version say: finding and outcome counts, median times, expected checks and time to a finding, and a check worth moving earlier.',
    roles: ['owner', 'lead'],
    async handler(req, res, ctx) {
      const shopId = req.member.shopId;
      const procedure = await ctx.ds.getRepository(Procedure).findOneBy({ id: String(req.params.id), shopId });
      if (!procedure) throw notFound('procedure');
      const number = /^\d{1,6}$/.test(String(req.params.number)) ? Number(req.params.number) : NaN;
      const version = Number.isInteger(number) ? await ctx.ds.getRepository(ProcedureVersion).findOneBy({ procedureId: procedure.id, number }) : null;
      if (!version) throw notFound('version');
      const diagnoses = await ctx.ds.getRepository(Diagnosis).find({ where: { shopId, versionId: version.id, status: 'concluded' } });
      const steps = diagnoses.length
        ? await ctx.ds.getRepository(DiagnosisStep).find({ where: { diagnosisId: In(diagnoses.map((d) => d.id)) }, order: { seq: 'ASC' } })
        : [];
      const byDiagnosis = new Map(diagnoses.map((d) => [d.id, [] as DiagnosisStep[]]));
      for (const s of steps) byDiagnosis.get(s.diagnosisId)!.push(s);
      const insight = procedureInsight(
        version.document,
        diagnoses.map((d) => ({
          startedAt: d.startedAt.toISOString(),
          endedAt: d.endedAt?.toISOString() ?? null,
          findingCheckId: d.conclusion?.findingCheckId ?? null,
          steps: byDiagnosis.get(d.id)!.map((s) => ({ checkId: s.checkId, nextCheckId: s.nextCheckId, retracted: s.retracted, recordedAt: s.recordedAt.toISOString() })),
        })),
      );
      const body: VersionInsight = { ...insight, procedureId: procedure.id, title: procedure.title, versionNumber: number, document: version.document };
      res.json({ insight: body });
    },
  },
];
