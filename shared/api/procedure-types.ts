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
  /** What changed, as written by whoever published it. */
  note: string | null;
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
  /** The highest-numbered version and its state (published or retired), if any was ever published. */
  latestVersion: { number: number; status: 'published' | 'retired' } | null;
  createdAt: string;
  /** The most recent change to any version: a draft save, a publish or a retirement. */
  lastEditedAt: string;
  lastEditedBy: string | null;
  /** Diagnoses started on any of its versions. */
  timesRun: number;
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

/** A picture uploaded for procedure checks; a check shows it with `{ src: id, alt }`. */
export interface ProcedurePictureView {
  id: string;
  contentType: string;
  size: number;
  createdAt: string;
}
