import type { ProcedureDocument } from '../engine/procedure';
import type { ValidationProblem } from '../engine/validate-procedure';

export type VersionStatus = 'draft' | 'published' | 'retired';

export interface VersionSummary {
  number: number | null;
  status: VersionStatus;
  revision: number;
  checkCount: number;
  publishedAt: string | null;
  publishedBy: string | null;
  updatedAt: string;
}

export interface ProcedureSummary {
  id: string;
  title: string;
  complaint: string;
  family: string;
  /** Highest published (not retired) version a diagnosis can start on, if any. */
  latestPublished: number | null;
  hasDraft: boolean;
  createdAt: string;
}

export interface ProcedureDetail extends ProcedureSummary {
  versions: VersionSummary[];
}

export interface VersionDetail extends VersionSummary {
  procedureId: string;
  document: ProcedureDocument;
}

export interface DraftDetail extends VersionDetail {
  problems: ValidationProblem[];
}
