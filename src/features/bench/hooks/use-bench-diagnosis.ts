import { useCallback, useEffect, useMemo } from 'react';
import { useDiagnosis } from '@/hooks/use-diagnosis';
import { useUser } from '@/lib/session';
import { keepDiagnosisCopy, readDiagnosisCopy } from '../offline/diagnosis-copy';
import { localDiagnosis } from '../offline/local-path';
import { dismiss, flush, prune, queue } from '../offline/outbox-store';
import { entriesOf, type StepBody } from '../offline/step-outbox';
import { useStepOutbox } from './use-step-outbox';

/**
 * A diagnosis as the bench works on it: the server's copy (or this device's last copy when there is no
 * signal), with the outbox's steps played on top. Recording and going back go through the outbox.
 */
export function useBenchDiagnosis(id: string) {
  const user = useUser();
  const copy = useMemo(() => readDiagnosisCopy(user.id, id), [user.id, id]);
  const swr = useDiagnosis(id, copy);
  const entries = useStepOutbox(user.id);
  const detail = swr.data?.diagnosis ?? null;

  useEffect(() => {
    if (!detail) return;
    keepDiagnosisCopy(user.id, detail);
    prune(id, detail);
  }, [detail, id, user.id]);

  const local = useMemo(() => (detail ? localDiagnosis(detail, entries, id) : null), [detail, entries, id]);
  const mine = useMemo(() => entriesOf(entries, id), [entries, id]);
  const offline = mine.some((e) => e.state.kind === 'waiting' && e.state.attempts > 0) || swr.error?.status === 0;

  const record = useCallback(
    (body: StepBody) => {
      const kept = queue(user.id, id, { kind: 'step', body });
      void flush(user.id);
      return kept;
    },
    [id, user.id],
  );
  const back = useCallback(() => {
    const kept = queue(user.id, id, { kind: 'back' });
    void flush(user.id);
    return kept;
  }, [id, user.id]);

  return {
    detail,
    local,
    error: swr.error,
    retryLoad: () => void swr.mutate(),
    offline,
    record,
    back,
    sendNow: () => void flush(user.id),
    dismissNotRecorded: () => dismiss(id),
  };
}
