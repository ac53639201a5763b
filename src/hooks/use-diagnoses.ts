import useSWR from 'swr';
import type { DiagnosisStatus, DiagnosisSummary } from '@shared/api/diagnosis-types';
import type { ApiError } from '@/lib/api';

/** The shop's diagnoses with one status, newest first. */
export function useDiagnoses(status: DiagnosisStatus) {
  return useSWR<{ diagnoses: DiagnosisSummary[] }, ApiError>(`/api/diagnoses?status=${status}`);
}
