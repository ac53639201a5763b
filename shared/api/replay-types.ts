import type { ProcedureDocument } from '../engine/procedure';
import type { ProcedureInsight } from '../insight/procedure-insight';
import type { PracticeAsk } from '../practice/schemas';

/** JSON shapes of step comments and practice attempts. */

export interface StepCommentView {
  id: string;
  diagnosisId: string;
  stepSeq: number;
  body: string;
  author: string;
  createdAt: string;
}

export interface PracticeAttemptView {
  id: string;
  runId: string;
  diagnosisId: string;
  stepSeq: number;
  checkId: string;
  asked: PracticeAsk;
  answer: string;
  /** Scored by the server from the recorded step. */
  correct: boolean;
  expected: string;
  userId: string;
  userName: string;
  procedureTitle: string;
  machine: string;
  createdAt: string;
}

/** The server's answer to a practice attempt: the score and why. */
export interface PracticeResult {
  attempt: PracticeAttemptView;
  expectedLabel: string;
  explanation: string;
}

/** What the concluded diagnoses of one procedure version say about it, with the version's document to draw. */
export interface VersionInsight extends ProcedureInsight {
  procedureId: string;
  title: string;
  versionNumber: number;
  document: ProcedureDocument;
}
