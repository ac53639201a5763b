import type { DiagnosisDetail } from '@shared/api/diagnosis-types';
import { keysStartingWith, readJSON, removeKey, writeJSON } from '@/lib/device-storage';

/**
 * The last copy of each open diagnosis this member opened on this device, so a reload without signal
 * still shows the check and the path. Dropped once the diagnosis is no longer open.
 */
const PREFIX = 'probepath.diagnosis-copy.';
const keyOf = (userId: string, diagnosisId: string) => `${PREFIX}${userId}.${diagnosisId}`;

export function readDiagnosisCopy(userId: string, diagnosisId: string): DiagnosisDetail | null {
  return readJSON<DiagnosisDetail>(keyOf(userId, diagnosisId));
}

export function keepDiagnosisCopy(userId: string, diagnosis: DiagnosisDetail): void {
  if (diagnosis.status === 'open') writeJSON(keyOf(userId, diagnosis.id), diagnosis);
  else removeKey(keyOf(userId, diagnosis.id));
}

/** Forgets copies of diagnoses that are no longer among the member's open ones. */
export function forgetClosedCopies(userId: string, openIds: readonly string[]): void {
  const open = new Set(openIds.map((id) => keyOf(userId, id)));
  for (const key of keysStartingWith(`${PREFIX}${userId}.`)) if (!open.has(key)) removeKey(key);
}
