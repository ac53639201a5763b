import type { DiagnosisDetail, StepView } from '@shared/api/diagnosis-types';
import { decideStep } from '@shared/diagnosis/decide-step';
import { pathSoFar } from '@shared/diagnosis/path-so-far';
import type { Evaluation } from '@shared/engine/evaluate';
import type { Verdict } from '@shared/engine/verdict';
import { entriesOf, type OutboxEntry, type StepBody } from './step-outbox';

/**
 * Where a diagnosis stands on this device: the server's steps, then what the outbox still holds, replayed
 * through `decideStep` on the pinned procedure version exactly as the server will replay it. Pure.
 */

export type PathStepState =
  /** The server has it. */
  | 'recorded'
  /** Typed on this device, waiting for the server. */
  | 'pending'
  /** Refused by the server, or held behind a refused one; kept to show what was typed. */
  | 'not_recorded';

export interface PathStep {
  /** The step's id on the server, or its outbox key. */
  key: string;
  seq: number | null;
  checkId: string;
  readingText: string | null;
  valueSi: number | null;
  overRange: boolean;
  verdict: Verdict | null;
  choiceId: string | null;
  evaluation: Evaluation | null;
  note: string;
  retracted: boolean;
  state: PathStepState;
  /** A "back" for this step is queued on the device. */
  retractionPending: boolean;
  /** Why the server did not record it. */
  problem: string | null;
}

export interface LocalDiagnosis {
  /** Every step in the order taken, retracted ones included. */
  steps: PathStep[];
  /** What was typed but not recorded, in order. */
  notRecorded: PathStep[];
  currentCheckId: string;
  /** Entries not yet answered by the server, refused ones included. */
  pendingCount: number;
  /** Of those, the ones played onto the path and waiting to be sent. */
  waitingCount: number;
}

type DiagnosisState = Pick<DiagnosisDetail, 'document' | 'steps' | 'currentCheckId' | 'ambientC'> & { meter: Pick<DiagnosisDetail['meter'], 'ranges'> };

export function localDiagnosis(detail: DiagnosisState, outbox: readonly OutboxEntry[], diagnosisId: string): LocalDiagnosis {
  const steps: PathStep[] = [...detail.steps].sort((a, b) => a.seq - b.seq).map((s) => fromServer(s));
  const notRecorded: PathStep[] = [];
  let current = detail.currentCheckId;
  let pendingCount = 0;
  let waitingCount = 0;
  let blocked: string | null = null;

  for (const entry of entriesOf(outbox, diagnosisId)) {
    const state = entry.state;
    if (state.kind === 'answered') {
      const answer = state.answer;
      if (answer.kind === 'step') {
        if (!steps.some((s) => s.key === answer.step.id)) steps.push(fromServer(answer.step));
      } else {
        const target = steps.find((s) => s.seq === answer.retractedSeq);
        if (target) target.retracted = true;
      }
      current = answer.currentCheckId;
      continue;
    }
    pendingCount++;
    if (state.kind === 'refused') blocked ??= state.message;
    if (blocked !== null) {
      if (entry.action.kind === 'step') notRecorded.push(unrecorded(entry.key, entry.action.body, state.kind === 'refused' ? state.message : `Held back: ${blocked}`));
      continue;
    }

    if (entry.action.kind === 'back') {
      const last = lastLive(steps);
      if (!last) {
        blocked = 'There was no step left to go back from.';
        continue;
      }
      last.retracted = true;
      last.retractionPending = true;
      current = last.checkId;
      waitingCount++;
      continue;
    }

    const body = entry.action.body;
    const decision =
      body.checkId === current
        ? decideStep(detail.document, body.checkId, { reading: body.reading, choiceId: body.choiceId }, { meterRanges: detail.meter.ranges, ambientC: detail.ambientC, path: pathSoFar(steps) })
        : null;
    if (!decision?.ok) {
      blocked = decision ? decision.message : 'The diagnosis had moved on from that check.';
      notRecorded.push(unrecorded(entry.key, body, blocked));
      continue;
    }
    steps.push({
      key: entry.key,
      seq: null,
      checkId: body.checkId,
      readingText: body.reading ?? null,
      valueSi: decision.value,
      overRange: decision.overRange,
      verdict: decision.verdict,
      choiceId: decision.choiceId,
      evaluation: decision.evaluation,
      note: body.note,
      retracted: false,
      state: 'pending',
      retractionPending: false,
      problem: null,
    });
    current = decision.nextCheckId;
    waitingCount++;
  }
  return { steps, notRecorded, currentCheckId: current, pendingCount, waitingCount };
}

function lastLive(steps: PathStep[]): PathStep | undefined {
  for (let i = steps.length - 1; i >= 0; i--) if (!steps[i].retracted) return steps[i];
  return undefined;
}

function fromServer(s: StepView): PathStep {
  return {
    key: s.id,
    seq: s.seq,
    checkId: s.checkId,
    readingText: s.readingText,
    valueSi: s.valueSi,
    overRange: s.overRange,
    verdict: s.verdict,
    choiceId: s.choiceId,
    evaluation: s.evaluation,
    note: s.note,
    retracted: s.retracted,
    state: 'recorded',
    retractionPending: false,
    problem: null,
  };
}

function unrecorded(key: string, body: StepBody, problem: string): PathStep {
  return {
    key,
    seq: null,
    checkId: body.checkId,
    readingText: body.reading ?? null,
    valueSi: null,
    overRange: false,
    verdict: null,
    choiceId: body.choiceId ?? null,
    evaluation: null,
    note: body.note,
    retracted: false,
    state: 'not_recorded',
    retractionPending: false,
    problem,
  };
}
