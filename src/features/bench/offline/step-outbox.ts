import type { StepView } from '@shared/api/diagnosis-types';

/**
 * The step outbox: what the technician recorded on this device, queued until the server has answered it.
 * Pure functions over a list of entries; `outbox-store.ts` keeps the list on the device and sends it.
 *
 * Rules:
 * - Entries go out one at a time, oldest first, each with its own Idempotency-Key, so a retry after a lost
 *   answer is recorded once and the server sees the steps in the order they were typed.
 * - A network failure, a timeout or a server error leaves the entry waiting; the next attempt sends the
 *   very same request.
 * - An answer the server will never change (e.g. the diagnosis moved on elsewhere) refuses the entry; it
 *   stays on the device to show what was typed, and the later entries of that diagnosis are held behind it
 *   because they were built on it. Other diagnoses carry on.
 * - An answered entry keeps the server's answer until the diagnosis is fetched again with it included.
 */

export interface StepBody {
  checkId: string;
  reading?: string;
  choiceId?: string;
  note: string;
}

export type OutboxAction = { kind: 'step'; body: StepBody } | { kind: 'back' };

export type ServerAnswer =
  | { kind: 'step'; step: StepView; currentCheckId: string }
  | { kind: 'back'; retractedSeq: number; currentCheckId: string };

export type EntryState =
  | { kind: 'waiting'; attempts: number; lastError: string | null }
  | { kind: 'refused'; code: string; message: string }
  | { kind: 'answered'; answer: ServerAnswer };

export interface OutboxEntry {
  /** Sent as the Idempotency-Key, the same on every attempt. */
  key: string;
  userId: string;
  diagnosisId: string;
  action: OutboxAction;
  /** Position in the queue: entries go out in this order. */
  order: number;
  queuedAt: string;
  state: EntryState;
}

export type Attempt = { ok: true; answer: ServerAnswer } | { ok: false; status: number; code: string; message: string };

export function enqueue(
  entries: readonly OutboxEntry[],
  entry: Pick<OutboxEntry, 'key' | 'userId' | 'diagnosisId' | 'action' | 'queuedAt'>,
): OutboxEntry[] {
  const order = entries.reduce((max, e) => Math.max(max, e.order), 0) + 1;
  return [...entries, { ...entry, order, state: { kind: 'waiting', attempts: 0, lastError: null } }];
}

const byOrder = (a: OutboxEntry, b: OutboxEntry) => a.order - b.order;

/** The next request to send for this member: the oldest waiting entry not held behind a refused one. */
export function nextToSend(entries: readonly OutboxEntry[], userId: string): OutboxEntry | null {
  const blocked = new Set<string>();
  for (const e of [...entries].sort(byOrder)) {
    if (e.userId !== userId) continue;
    if (e.state.kind === 'refused') blocked.add(e.diagnosisId);
    else if (e.state.kind === 'waiting' && !blocked.has(e.diagnosisId)) return e;
  }
  return null;
}

/** The request an entry stands for; identical on every attempt. */
export function requestOf(entry: OutboxEntry): { path: string; body: StepBody | Record<string, never> } {
  const base = `/api/diagnoses/${entry.diagnosisId}`;
  return entry.action.kind === 'step' ? { path: `${base}/steps`, body: entry.action.body } : { path: `${base}/back`, body: {} };
}

/**
 * Whether a failed attempt is worth repeating: no answer at all, a timeout, throttling, a server fault, or
 * an expired session (the member signs in again and the entry goes then).
 */
export function isWorthRetrying(status: number): boolean {
  return status === 0 || status === 401 || status === 408 || status === 425 || status === 429 || status >= 500;
}

/** The queue after an attempt to send the entry with this key. */
export function settle(entries: readonly OutboxEntry[], key: string, attempt: Attempt): OutboxEntry[] {
  return entries.map((e): OutboxEntry => {
    if (e.key !== key) return e;
    if (attempt.ok) return { ...e, state: { kind: 'answered', answer: attempt.answer } };
    if (isWorthRetrying(attempt.status)) {
      const attempts = e.state.kind === 'waiting' ? e.state.attempts + 1 : 1;
      return { ...e, state: { kind: 'waiting', attempts, lastError: attempt.message } };
    }
    return { ...e, state: { kind: 'refused', code: attempt.code, message: attempt.message } };
  });
}

/** The entries of one diagnosis, oldest first. */
export function entriesOf(entries: readonly OutboxEntry[], diagnosisId: string): OutboxEntry[] {
  return entries.filter((e) => e.diagnosisId === diagnosisId).sort(byOrder);
}

/**
 * Drops answered entries whose effect the fetched diagnosis already shows: the recorded step is in its list,
 * the retracted step is marked retracted.
 */
export function pruneAnswered(entries: readonly OutboxEntry[], diagnosisId: string, steps: readonly Pick<StepView, 'id' | 'seq' | 'retracted'>[]): OutboxEntry[] {
  return entries.filter((e) => {
    if (e.diagnosisId !== diagnosisId || e.state.kind !== 'answered') return true;
    const answer = e.state.answer;
    if (answer.kind === 'step') return !steps.some((s) => s.id === answer.step.id);
    return !steps.some((s) => s.seq === answer.retractedSeq && s.retracted);
  });
}

/** After the technician has seen them: the refused entries of a diagnosis and those held behind them. */
export function dismissRefused(entries: readonly OutboxEntry[], diagnosisId: string): OutboxEntry[] {
  const firstRefused = entriesOf(entries, diagnosisId).find((e) => e.state.kind === 'refused');
  if (!firstRefused) return [...entries];
  return entries.filter((e) => e.diagnosisId !== diagnosisId || e.order < firstRefused.order || e.state.kind === 'answered');
}

/** How many of a diagnosis's entries the server has not answered yet. */
export function unsentCount(entries: readonly OutboxEntry[], diagnosisId?: string): number {
  return entries.filter((e) => (diagnosisId === undefined || e.diagnosisId === diagnosisId) && e.state.kind !== 'answered').length;
}
