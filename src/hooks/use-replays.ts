import useSWR from 'swr';
import useSWRMutation from 'swr/mutation';
import type { DiagnosisDetail, DiagnosisSummary } from '@shared/api/diagnosis-types';
import type { StepCommentView } from '@shared/api/replay-types';
import { api, type ApiError } from '@/lib/api';
import { randomUuid } from '@/lib/random-uuid';

/** Concluded diagnoses to replay, newest first (at most 200). */
export function useReplayList() {
  return useSWR<{ diagnoses: DiagnosisSummary[] }, ApiError>('/api/diagnoses?status=concluded');
}

/** One diagnosis with its pinned procedure and every step, retracted ones included. */
export function useReplay(id: string | undefined) {
  return useSWR<{ diagnosis: DiagnosisDetail }, ApiError>(id ? `/api/diagnoses/${id}` : null);
}

export function useStepComments(id: string | undefined) {
  return useSWR<{ comments: StepCommentView[] }, ApiError>(id ? `/api/diagnoses/${id}/comments` : null);
}

/** A lead's comment on one step; the comment list refreshes afterwards. */
export function useAddStepComment(id: string) {
  return useSWRMutation<{ comment: StepCommentView }, ApiError, string, { seq: number; body: string }>(`/api/diagnoses/${id}/comments`, (_key, { arg }) =>
    api(`/api/diagnoses/${id}/steps/${arg.seq}/comments`, 'POST', { body: arg.body }, { idempotencyKey: randomUuid() }),
  );
}
