import { describe, expect, it } from 'vitest';
import type { StepView } from '@shared/api/diagnosis-types';
import {
  type Attempt,
  dismissRefused,
  enqueue,
  nextToSend,
  type OutboxEntry,
  pruneAnswered,
  requestOf,
  settle,
  unsentCount,
} from '@/features/bench/offline/step-outbox';

const TECH = 'user-tech';
const at = '2026-03-02T10:00:00.000Z';

function queueOf(...items: [key: string, diagnosisId: string, reading: string | null][]): OutboxEntry[] {
  return items.reduce<OutboxEntry[]>(
    (q, [key, diagnosisId, reading]) =>
      enqueue(q, {
        key,
        userId: TECH,
        diagnosisId,
        queuedAt: at,
        action: reading === null ? { kind: 'back' } : { kind: 'step', body: { checkId: `check-${key}`, reading, note: '' } },
      }),
    [],
  );
}

const step = (id: string, seq: number): StepView => ({
  id,
  seq,
  checkId: `check-${id}`,
  readingText: '1 V',
  valueSi: 1,
  overRange: false,
  verdict: 'in_spec',
  choiceId: null,
  evaluation: null,
  nextCheckId: 'next',
  note: '',
  by: 'Tech',
  recordedAt: at,
  retracted: false,
  retractedAt: null,
});

const answered = (id: string, seq: number): Attempt => ({ ok: true, answer: { kind: 'step', step: step(id, seq), currentCheckId: 'next' } });
const failed = (status: number, code = 'unreachable'): Attempt => ({ ok: false, status, code, message: `failed with ${status}` });

describe('the order of sending', () => {
  it('sends the oldest waiting entry first and skips other members’ entries', () => {
    let q = queueOf(['a', 'd1', '1 V'], ['b', 'd1', '2 V']);
    q = enqueue(q, { key: 'other', userId: 'someone-else', diagnosisId: 'd1', queuedAt: at, action: { kind: 'back' } });
    expect(q.map((e) => e.order)).toEqual([1, 2, 3]);
    expect(nextToSend(q, TECH)?.key).toBe('a');
    q = settle(q, 'a', answered('a', 1));
    expect(nextToSend(q, TECH)?.key).toBe('b');
    q = settle(q, 'b', answered('b', 2));
    expect(nextToSend(q, TECH)).toBeNull();
    expect(nextToSend(q, 'someone-else')?.key).toBe('other');
  });

  it('keeps the order it was typed in even when the list is stored shuffled', () => {
    const q = queueOf(['a', 'd1', '1 V'], ['b', 'd1', '2 V'], ['c', 'd1', null]);
    expect(nextToSend([...q].reverse(), TECH)?.key).toBe('a');
  });
});

describe('failed attempts', () => {
  it.each([0, 408, 429, 500, 503, 401])('status %s leaves the entry waiting, to be sent again as the same request', (status) => {
    let q = queueOf(['a', 'd1', '0.45 kΩ']);
    const before = requestOf(nextToSend(q, TECH)!);
    q = settle(q, 'a', failed(status));
    q = settle(q, 'a', failed(status));
    const entry = nextToSend(q, TECH)!;
    expect(entry.key).toBe('a');
    expect(entry.state).toMatchObject({ kind: 'waiting', attempts: 2, lastError: `failed with ${status}` });
    expect(requestOf(entry)).toEqual(before);
  });

  it('a refusal stops that diagnosis’s later entries, which were built on it, but not other diagnoses', () => {
    let q = queueOf(['a', 'd1', '1 V'], ['b', 'd1', '2 V'], ['c', 'd2', '3 V']);
    q = settle(q, 'a', failed(409, 'not_current_check'));
    expect(q[0].state).toEqual({ kind: 'refused', code: 'not_current_check', message: 'failed with 409' });
    expect(nextToSend(q, TECH)?.key).toBe('c');
    expect(unsentCount(q, 'd1')).toBe(2);
  });

  it('dismissing removes the refused entry and those held behind it, nothing else', () => {
    let q = queueOf(['a', 'd1', '1 V'], ['b', 'd1', '2 V'], ['c', 'd1', '3 V'], ['d', 'd2', '4 V']);
    q = settle(q, 'a', answered('a', 1));
    q = settle(q, 'b', failed(400, 'unreadable_reading'));
    expect(dismissRefused(q, 'd1').map((e) => e.key)).toEqual(['a', 'd']);
    expect(dismissRefused(q, 'd2')).toEqual(q);
  });
});

describe('the requests', () => {
  it('a step posts its body to the steps route, a back posts nothing to the back route', () => {
    const [s, b] = queueOf(['a', 'd1', '12,6 V'], ['b', 'd1', null]);
    expect(requestOf(s)).toEqual({ path: '/api/diagnoses/d1/steps', body: { checkId: 'check-a', reading: '12,6 V', note: '' } });
    expect(requestOf(b)).toEqual({ path: '/api/diagnoses/d1/back', body: {} });
  });
});

describe('answered entries', () => {
  it('are never sent again and are dropped once the fetched diagnosis shows them', () => {
    let q = queueOf(['a', 'd1', '1 V'], ['b', 'd1', null]);
    q = settle(q, 'a', answered('server-a', 1));
    q = settle(q, 'b', { ok: true, answer: { kind: 'back', retractedSeq: 1, currentCheckId: 'check-a' } });
    expect(nextToSend(q, TECH)).toBeNull();
    expect(unsentCount(q)).toBe(0);

    expect(pruneAnswered(q, 'd1', [])).toHaveLength(2);
    const recorded = pruneAnswered(q, 'd1', [step('server-a', 1)]);
    expect(recorded.map((e) => e.key)).toEqual(['b']);
    expect(pruneAnswered(recorded, 'd1', [{ ...step('server-a', 1), retracted: true }])).toEqual([]);
  });
});

describe('a bad-signal afternoon against a server that honours Idempotency-Key', () => {
  it('records every entry exactly once, in order, however the network fails', () => {
    const recorded: string[] = [];
    const answers = new Map<string, Attempt>();
    const server = (key: string, reading: string): Attempt => {
      if (!answers.has(key)) {
        recorded.push(reading);
        answers.set(key, answered(`s-${key}`, recorded.length));
      }
      return answers.get(key)!;
    };
    // Every third request never reaches the server; every fourth reaches it but the answer is lost.
    let n = 0;
    const network = (entry: OutboxEntry): Attempt => {
      n++;
      if (n % 3 === 0) return failed(0);
      const body = requestOf(entry).body as { reading: string };
      const answer = server(entry.key, body.reading);
      return n % 4 === 0 ? failed(0) : answer;
    };

    const readings = Array.from({ length: 12 }, (_, i) => `${i + 1} V`);
    let q = queueOf(...readings.map((r, i): [string, string, string] => [`k${i}`, 'd1', r]));
    for (let guard = 0; guard < 100; guard++) {
      const next = nextToSend(q, TECH);
      if (!next) break;
      q = settle(q, next.key, network(next));
    }
    expect(recorded).toEqual(readings);
    expect(unsentCount(q)).toBe(0);
  });
});
