import useSWR from 'swr';
import useSWRMutation from 'swr/mutation';
import type { PracticeAttemptView, PracticeResult } from '@shared/api/replay-types';
import type { PracticeAttemptInput } from '@shared/practice/schemas';
import { api, type ApiError } from '@/lib/api';

const KEY = '/api/practice/attempts';

/** Practice answers: an apprentice's own, or the team's for a lead or owner. */
export function usePracticeAttempts() {
  return useSWR<{ attempts: PracticeAttemptView[] }, ApiError>(KEY);
}

/**
 * Sends one answer; the server scores it and says why. The key names the question within the pass, so a
 * retry after a lost answer gets the stored score back instead of a second attempt.
 */
export function useAnswerPractice() {
  return useSWRMutation<PracticeResult, ApiError, string, PracticeAttemptInput>(KEY, (path, { arg }) =>
    api<PracticeResult>(path, 'POST', arg, { idempotencyKey: `${arg.runId}-${arg.stepSeq}-${arg.asked}` }),
  );
}
