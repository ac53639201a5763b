import useSWR from 'swr';
import useSWRMutation from 'swr/mutation';
import type { ConclusionView, DiagnosisDetail } from '@shared/api/diagnosis-types';
import type { AbandonInput, ConcludeInput, StartDiagnosisInput } from '@shared/diagnosis/schemas';
import { api, type ApiError } from '@/lib/api';

export const diagnosisKey = (id: string) => `/api/diagnoses/${id}`;

/** Matches every cached list of diagnoses, to refresh them after a write. */
export const DIAGNOSIS_LISTS = (key: unknown) => typeof key === 'string' && key.startsWith('/api/diagnoses?');

/** One diagnosis with its pinned procedure and every step; `fallback` is shown until (or unless) the server answers. */
export function useDiagnosis(id: string | undefined, fallback: DiagnosisDetail | null = null) {
  return useSWR<{ diagnosis: DiagnosisDetail }, ApiError>(id ? diagnosisKey(id) : null, {
    fallbackData: fallback ? { diagnosis: fallback } : undefined,
  });
}

/** Starts a diagnosis; `key` is the Idempotency-Key, the same for every retry of the same start. */
export function useStartDiagnosis() {
  return useSWRMutation<{ diagnosis: DiagnosisDetail }, ApiError, string, { input: StartDiagnosisInput; key: string }>(
    '/api/diagnoses',
    (path, { arg }) => api(path, 'POST', arg.input, { idempotencyKey: arg.key }),
    { revalidate: false },
  );
}

export function useConcludeDiagnosis(id: string) {
  return useSWRMutation<{ status: 'concluded'; conclusion: ConclusionView }, ApiError, string, { input: ConcludeInput; key: string }>(
    diagnosisKey(id),
    (path, { arg }) => api(`${path}/conclude`, 'POST', arg.input, { idempotencyKey: arg.key }),
  );
}

/** Stops a diagnosis without a finding; the diagnosis is fetched again afterwards and shows as stopped. */
export function useAbandonDiagnosis(id: string) {
  return useSWRMutation<{ status: 'abandoned' }, ApiError, string, { input: AbandonInput; key: string }>(
    diagnosisKey(id),
    (path, { arg }) => api(`${path}/abandon`, 'POST', arg.input, { idempotencyKey: arg.key }),
  );
}
