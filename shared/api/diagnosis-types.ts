import type { Evaluation } from '../engine/evaluate';
import type { ProcedureDocument } from '../engine/procedure';
import type { Verdict } from '../engine/verdict';
import type { JobView, MeterView } from './workshop-types';

export type DiagnosisStatus = 'open' | 'concluded' | 'abandoned';

export interface StepView {
  id: string;
  seq: number;
  checkId: string;
  /** Exactly what was typed. */
  readingText: string | null;
  valueSi: number | null;
  overRange: boolean;
  verdict: Verdict | null;
  choiceId: string | null;
  evaluation: Evaluation | null;
  nextCheckId: string | null;
  note: string;
  by: string;
  recordedAt: string;
  retracted: boolean;
  retractedAt: string | null;
}

/** A photo of a step (stepId) or of the diagnosis as a whole (stepId null); its bytes are at /api/photos/:id. */
export interface PhotoView {
  id: string;
  stepId: string | null;
  contentType: string;
  size: number;
  createdAt: string;
}

export interface ConclusionView {
  findingCheckId: string;
  note: string;
  parts: string;
  labourMinutes: number | null;
}

export interface DiagnosisSummary {
  id: string;
  status: DiagnosisStatus;
  procedureId: string;
  procedureTitle: string;
  versionNumber: number;
  complaint: string;
  customerName: string;
  machine: string;
  startedBy: string;
  startedAt: string;
  endedAt: string | null;
  currentCheckId: string;
  /** Title of the finding once concluded. */
  finding: string | null;
  stepCount: number;
}

export interface DiagnosisDetail extends DiagnosisSummary {
  ambientC: number;
  job: JobView;
  meter: MeterView;
  /** The pinned version's document: every check the path can visit. */
  document: ProcedureDocument;
  steps: StepView[];
  /** Oldest first. */
  photos: PhotoView[];
  conclusion: ConclusionView | null;
  abandonReason: string | null;
}

export interface StepAnswer {
  step: StepView;
  currentCheckId: string;
}
