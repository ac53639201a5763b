import { describe, expect, it } from 'vitest';
import type { StepView } from '@shared/api/diagnosis-types';
import { decideStep } from '@shared/diagnosis/decide-step';
import type { MeterRange } from '@shared/workshop/schemas';
import { localDiagnosis } from '@/features/bench/offline/local-path';
import { enqueue, type OutboxAction, type OutboxEntry, settle } from '@/features/bench/offline/step-outbox';
import { demoProcedure } from '../engine/demo-procedure';

// An invented meter: ±(0.8 % + 3 counts) on ohms, ±(1 % + 3 counts) on diode test.
const RANGES: MeterRange[] = [
  { function: 'ohms', rangeMax: 2000, resolution: 1, pctOfReading: 0.8, counts: 3 },
  { function: 'dc_volts', rangeMax: 60, resolution: 0.01, pctOfReading: 0.5, counts: 2 },
  { function: 'diode', rangeMax: 3, resolution: 0.001, pctOfReading: 1, counts: 3 },
];
const document = demoProcedure();
const at = '2026-03-02T10:00:00.000Z';

function detail(steps: StepView[], currentCheckId: string) {
  return { document, steps, currentCheckId, ambientC: 20, meter: { ranges: RANGES } };
}

function serverStep(seq: number, checkId: string, input: { reading?: string; choiceId?: string }, earlier: StepView[] = []): StepView {
  const path = earlier.filter((s) => !s.retracted).map((s) => ({ checkId: s.checkId, value: s.valueSi, overRange: s.overRange, uncertainty: s.evaluation?.uncertainty }));
  const d = decideStep(document, checkId, input, { meterRanges: RANGES, ambientC: 20, path });
  if (!d.ok) throw new Error(d.message);
  return {
    id: `step-${seq}`,
    seq,
    checkId,
    readingText: input.reading ?? null,
    valueSi: d.value,
    overRange: d.overRange,
    verdict: d.verdict,
    choiceId: d.choiceId,
    evaluation: d.evaluation,
    nextCheckId: d.nextCheckId,
    note: '',
    by: 'Tech',
    recordedAt: at,
    retracted: false,
    retractedAt: null,
  };
}

function outbox(...actions: OutboxAction[]): OutboxEntry[] {
  return actions.reduce<OutboxEntry[]>((q, action, i) => enqueue(q, { key: `k${i}`, userId: 'u', diagnosisId: 'd1', queuedAt: at, action }), []);
}
const typed = (checkId: string, reading: string, note = ''): OutboxAction => ({ kind: 'step', body: { checkId, reading, note } });
const picked = (checkId: string, choiceId: string): OutboxAction => ({ kind: 'step', body: { checkId, choiceId, note: '' } });

describe('where a diagnosis stands on the device', () => {
  it('is the server’s path when nothing waits', () => {
    const s1 = serverStep(1, 'spark', { choiceId: 'none' });
    const local = localDiagnosis(detail([s1], 'battery'), [], 'd1');
    expect(local.currentCheckId).toBe('battery');
    expect(local.steps.map((s) => [s.key, s.state])).toEqual([['step-1', 'recorded']]);
    expect(local.pendingCount).toBe(0);
  });

  it('plays waiting steps through the engine, prefixes and all, and moves to the check they lead to', () => {
    const local = localDiagnosis(detail([], 'spark'), outbox(picked('spark', 'none'), typed('battery', '12,6 V'), typed('ckp-ohms', '0.45k')), 'd1');
    expect(local.steps.map((s) => [s.checkId, s.state, s.verdict])).toEqual([
      ['spark', 'pending', null],
      ['battery', 'pending', 'in_spec'],
      ['ckp-ohms', 'pending', 'in_spec'],
    ]);
    expect(local.steps[2].valueSi).toBe(450);
    expect(local.currentCheckId).toBe('ckp-ecu');
    expect(local.pendingCount).toBe(3);
    expect(local.waitingCount).toBe(3);
  });

  it('reaches the same verdicts and next checks as the server will', () => {
    const s1 = serverStep(1, 'spark', { choiceId: 'none' });
    const s2 = serverStep(2, 'battery', { reading: '12.61' }, [s1]);
    const local = localDiagnosis(detail([s1, s2], 'ckp-ohms'), outbox(typed('ckp-ohms', '497 Ω')), 'd1');
    const server = serverStep(3, 'ckp-ohms', { reading: '497 Ω' }, [s1, s2]);
    expect(local.steps[2]).toMatchObject({ verdict: server.verdict, evaluation: server.evaluation });
    expect(server.verdict).toBe('marginal');
    expect(local.currentCheckId).toBe(server.nextCheckId);
  });

  it('pairs a check with an earlier reading that is itself still waiting', () => {
    const local = localDiagnosis(detail([], 'diode-fwd'), outbox(typed('diode-fwd', '0.6'), typed('diode-rev', 'OL')), 'd1');
    expect(local.steps[1]).toMatchObject({ verdict: 'in_spec', overRange: true });
    expect(local.currentCheckId).toBe('f-ecu');
  });

  it('a waiting "back" strikes the last live step and returns to its check, deleting nothing', () => {
    const s1 = serverStep(1, 'spark', { choiceId: 'none' });
    const s2 = serverStep(2, 'battery', { reading: '12.61' }, [s1]);
    const local = localDiagnosis(detail([s1, s2], 'ckp-ohms'), outbox({ kind: 'back' }, typed('battery', '12.7 V')), 'd1');
    expect(local.steps.map((s) => [s.checkId, s.retracted, s.retractionPending, s.state])).toEqual([
      ['spark', false, false, 'recorded'],
      ['battery', true, true, 'recorded'],
      ['battery', false, false, 'pending'],
    ]);
    expect(local.currentCheckId).toBe('ckp-ohms');
  });

  it('shows the server’s answer until the fetched diagnosis includes it, and never twice', () => {
    const s1 = serverStep(1, 'spark', { choiceId: 'none' });
    let q = outbox(picked('spark', 'none'));
    q = settle(q, 'k0', { ok: true, answer: { kind: 'step', step: s1, currentCheckId: 'battery' } });
    const before = localDiagnosis(detail([], 'spark'), q, 'd1');
    expect(before.steps.map((s) => [s.key, s.state])).toEqual([['step-1', 'recorded']]);
    expect(before.currentCheckId).toBe('battery');
    const after = localDiagnosis(detail([s1], 'battery'), q, 'd1');
    expect(after.steps).toHaveLength(1);
    expect(after.pendingCount).toBe(0);
  });

  it('keeps a refused step and those after it visible as not recorded, and does not move on', () => {
    let q = outbox(typed('battery', '12.6'), typed('ckp-ohms', '450'));
    q = settle(q, 'k0', { ok: false, status: 409, code: 'not_current_check', message: 'The diagnosis has moved on from that check.' });
    const local = localDiagnosis(detail([], 'battery'), q, 'd1');
    expect(local.steps).toEqual([]);
    expect(local.currentCheckId).toBe('battery');
    expect(local.notRecorded.map((s) => [s.readingText, s.state])).toEqual([
      ['12.6', 'not_recorded'],
      ['450', 'not_recorded'],
    ]);
    expect(local.notRecorded[1].problem).toContain('Held back');
    expect([local.pendingCount, local.waitingCount]).toEqual([2, 0]);
  });

  it('does not apply a waiting step typed for a check the diagnosis is no longer at', () => {
    const local = localDiagnosis(detail([], 'battery'), outbox(typed('ckp-ohms', '450')), 'd1');
    expect(local.steps).toEqual([]);
    expect(local.notRecorded[0].problem).toContain('moved on');
  });
});
