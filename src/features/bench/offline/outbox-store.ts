import { mutate } from 'swr';
import type { DiagnosisDetail, StepAnswer } from '@shared/api/diagnosis-types';
import { diagnosisKey, DIAGNOSIS_LISTS } from '@/hooks/use-diagnosis';
import { api, ApiError } from '@/lib/api';
import { readJSON, removeKey, writeJSON } from '@/lib/device-storage';
import { newIdempotencyKey } from '@/lib/idempotency-key';
import { keepDiagnosisCopy } from './diagnosis-copy';
import {
  dismissRefused,
  enqueue,
  nextToSend,
  type OutboxAction,
  type OutboxEntry,
  pruneAnswered,
  requestOf,
  type ServerAnswer,
  settle,
  type Attempt,
  isWorthRetrying,
} from './step-outbox';

/**
 * The device's step outbox: the queue from `step-outbox.ts`, kept in device storage after every change and
 * sent one request at a time. Components read it through `useStepOutbox`.
 */
const STORAGE_KEY = 'probepath.step-outbox';

let entries: OutboxEntry[] = readJSON<OutboxEntry[]>(STORAGE_KEY) ?? [];
let lastSaveFailed = false;
const listeners = new Set<() => void>();
let flushing: Promise<void> | null = null;

function commit(next: OutboxEntry[]) {
  entries = next;
  if (next.length) lastSaveFailed = !writeJSON(STORAGE_KEY, next);
  else removeKey(STORAGE_KEY);
  for (const listener of listeners) listener();
}

export function subscribe(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

export const snapshot = (): readonly OutboxEntry[] => entries;

/** Puts a step or a "back" in the queue, saved on the device before anything is sent. False when the device could not save it. */
export function queue(userId: string, diagnosisId: string, action: OutboxAction): boolean {
  commit(enqueue(entries, { key: newIdempotencyKey(), userId, diagnosisId, action, queuedAt: new Date().toISOString() }));
  return !lastSaveFailed;
}

export function dismiss(diagnosisId: string) {
  commit(dismissRefused(entries, diagnosisId));
}

/** Drops answers the fetched diagnosis already includes. */
export function prune(diagnosisId: string, detail: DiagnosisDetail) {
  const next = pruneAnswered(entries, diagnosisId, detail.steps);
  if (next.length !== entries.length) commit(next);
}

/**
 * Sends the member's waiting entries in order until one can't get through. Then fetches each diagnosis it
 * touched, so the screens, the device's copy and the queue agree with the server. One run at a time.
 */
export function flush(userId: string): Promise<void> {
  flushing ??= (async () => {
    const touched = new Set<string>();
    for (let next = nextToSend(entries, userId); next; next = nextToSend(entries, userId)) {
      const attempt = await send(next);
      commit(settle(entries, next.key, attempt));
      touched.add(next.diagnosisId);
      if (!attempt.ok && isWorthRetrying(attempt.status)) break;
    }
    await Promise.all([...touched].map((id) => refresh(userId, id)));
  })().finally(() => {
    flushing = null;
  });
  return flushing;
}

async function send(entry: OutboxEntry): Promise<Attempt> {
  const { path, body } = requestOf(entry);
  try {
    const answer = await api<StepAnswer | { retractedSeq: number; currentCheckId: string }>(path, 'POST', body, { idempotencyKey: entry.key });
    const settled: ServerAnswer = 'step' in answer ? { kind: 'step', ...answer } : { kind: 'back', ...answer };
    return { ok: true, answer: settled };
  } catch (error) {
    const e = error instanceof ApiError ? error : new ApiError(0, 'unreachable', 'No answer from the server.');
    return { ok: false, status: e.status, code: e.code, message: e.message };
  }
}

async function refresh(userId: string, diagnosisId: string) {
  try {
    const fresh = await api<{ diagnosis: DiagnosisDetail }>(diagnosisKey(diagnosisId));
    keepDiagnosisCopy(userId, fresh.diagnosis);
    await mutate(diagnosisKey(diagnosisId), fresh, { revalidate: false });
    prune(diagnosisId, fresh.diagnosis);
    await mutate(DIAGNOSIS_LISTS);
  } catch {
    // Still no signal: the answers stay in the queue until the next run.
  }
}
