import type { ReactNode } from 'react';
import type { DiagnosisDetail } from '@shared/api/diagnosis-types';
import type { Check } from '@shared/engine/procedure';
import type { LocalDiagnosis } from '../offline/local-path';
import type { StepBody } from '../offline/step-outbox';

/** What every kind of check screen gets from the diagnosis screen. */
export interface StepProps<C extends Check = Check> {
  detail: DiagnosisDetail;
  local: LocalDiagnosis;
  check: C;
  /** 1 for the first check of the path. */
  number: number;
  onRecord: (body: StepBody) => void;
  /** Take back the last step; absent at the first check. */
  onBack: (() => void) | null;
  /** Shown above the check: where sending stands. */
  status: ReactNode;
  /** Shown below the check: photos of the step just recorded. */
  footer: ReactNode;
}
