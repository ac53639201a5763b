import useSWR from 'swr';
import useSWRMutation from 'swr/mutation';
import type { DraftDetail, ProcedureDetail, ProcedureSummary, VersionDetail } from '@shared/api/procedure-types';
import type { CreateProcedureInput } from '@shared/procedures/schemas';
import { api, type ApiError } from '@/lib/api';

const KEY = '/api/procedures';

export function useProcedures() {
  return useSWR<{ procedures: ProcedureSummary[] }, ApiError>(KEY);
}

export function useCreateProcedure() {
  return useSWRMutation<{ procedure: ProcedureSummary }, ApiError, string, CreateProcedureInput>(KEY, (path, { arg }) => api(path, 'POST', arg));
}

/** Import a probepath.procedure file (already read as JSON) as a new procedure. */
export function useImportProcedure() {
  return useSWRMutation<{ procedure: ProcedureSummary }, ApiError, string, unknown>(KEY, (path, { arg }) => api(`${path}/import`, 'POST', arg));
}

/** Duplicate a procedure: a new one whose draft copies its draft, else its latest version. */
export function useDuplicateProcedure() {
  return useSWRMutation<{ procedure: ProcedureSummary }, ApiError, string, string>(KEY, (path, { arg: id }) => api(`${path}/${id}/copy`, 'POST', {}));
}

export function useProcedure(id: string | undefined) {
  return useSWR<{ procedure: ProcedureDetail }, ApiError>(id ? `${KEY}/${id}` : null);
}

/** The draft, fetched once per open: the editor owns it from then on and saves it with its revision. */
export function useDraft(id: string | undefined) {
  return useSWR<{ draft: DraftDetail }, ApiError>(id ? `${KEY}/${id}/draft` : null, { revalidateOnFocus: false, revalidateOnReconnect: false, shouldRetryOnError: false });
}

export function useProcedureVersion(id: string, number: number | null) {
  return useSWR<{ version: VersionDetail }, ApiError>(number ? `${KEY}/${id}/versions/${number}` : null);
}
