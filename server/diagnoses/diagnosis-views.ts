import type { DiagnosisDetail, DiagnosisSummary, StepView } from '@shared/api/diagnosis-types';
import type { Evaluation } from '@shared/engine/evaluate';
import { toJobView } from '../jobs/jobs.routes';
import { toMeterView } from '../meters/meters.routes';
import type { DiagnosisPhoto } from '../photos/photo.entity';
import { toPhotoView } from '../photos/photo-views';
import type { Procedure } from '../procedures/procedure.entity';
import type { ProcedureVersion } from '../procedures/procedure-version.entity';
import type { User } from '../users/user.entity';
import type { DiagnosisStep } from './diagnosis-step.entity';
import type { Diagnosis } from './diagnosis.entity';

export type LoadedDiagnosis = Diagnosis & {
  version: ProcedureVersion & { procedure: Procedure };
  startedBy: User;
};

export const toStepView = (s: DiagnosisStep, byName: string): StepView => ({
  id: s.id,
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
  by: byName,
  recordedAt: s.recordedAt.toISOString(),
  retracted: s.retracted,
  retractedAt: s.retractedAt?.toISOString() ?? null,
});

export function toSummary(d: LoadedDiagnosis, stepCount: number): DiagnosisSummary {
  const finding = d.conclusion ? d.version.document.checks.find((c) => c.id === d.conclusion!.findingCheckId) : undefined;
  return {
    id: d.id,
    status: d.status,
    procedureId: d.version.procedureId,
    procedureTitle: d.version.procedure.title,
    versionNumber: d.version.number ?? 0,
    complaint: d.job.complaint,
    customerName: d.job.customerName,
    machine: `${d.machine.year} ${d.machine.make} ${d.machine.model}`,
    startedBy: d.startedBy.name,
    startedAt: d.startedAt.toISOString(),
    endedAt: d.endedAt?.toISOString() ?? null,
    currentCheckId: d.currentCheckId,
    finding: finding?.title ?? null,
    stepCount,
  };
}

export function toDetail(d: LoadedDiagnosis, steps: (DiagnosisStep & { by: User })[], photos: DiagnosisPhoto[]): DiagnosisDetail {
  return {
    ...toSummary(d, steps.filter((s) => !s.retracted).length),
    ambientC: d.ambientC,
    job: toJobView({ ...d.job, machine: d.machine }),
    meter: toMeterView(d.meter),
    document: d.version.document,
    steps: steps.map((s) => toStepView(s, s.by.name)),
    photos: photos.map(toPhotoView),
    conclusion: d.conclusion,
    abandonReason: d.abandonReason,
  };
}
