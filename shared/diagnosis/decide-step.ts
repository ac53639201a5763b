import { evaluate, type Evaluation, type PriorReading } from '../engine/evaluate';
import { parseReading } from '../engine/parse-reading';
import type { ProcedureDocument } from '../engine/procedure';
import type { Verdict } from '../engine/verdict';
import { nextCheckId, type StepInput } from '../engine/walk';
import type { MeterRange } from '../workshop/schemas';
import { accuracyFor } from './meter-accuracy';

/** The steps already on the path (retracted ones left out), oldest first. */
export type PathSoFar = readonly { checkId: string; value: number | null; overRange: boolean; uncertainty?: number }[];

export interface StepContext {
  meterRanges: readonly MeterRange[];
  ambientC: number;
  path: PathSoFar;
}

export type StepDecision =
  | {
      ok: true;
      value: number | null;
      overRange: boolean;
      verdict: Verdict | null;
      evaluation: Evaluation | null;
      choiceId: string | null;
      nextCheckId: string;
    }
  | { ok: false; code: string; field: 'reading' | 'choiceId' | 'checkId'; message: string };

/**
 * One step of a diagnosis from what the technician entered: parse the reading,
 * judge it with the meter's accuracy at the ambient temperature, and pick the
 * next check. The server runs it to record the step; the phone runs the same
 * function to show the verdict at once and to keep going without signal.
 */
export function decideStep(document: ProcedureDocument, checkId: string, input: { reading?: string; choiceId?: string }, ctx: StepContext): StepDecision {
  const check = document.checks.find((c) => c.id === checkId);
  if (!check) return { ok: false, code: 'unknown_check', field: 'checkId', message: `There is no check “${checkId}” in this procedure version.` };
  if (check.kind === 'finding') {
    return { ok: false, code: 'at_finding', field: 'checkId', message: 'This is a finding: conclude the diagnosis instead of recording a step.' };
  }
  // The step being recorded is a visit too, so a check that loops back to itself runs at most maxVisits times.
  const visits = countVisits(ctx.path);
  visits.set(check.id, (visits.get(check.id) ?? 0) + 1);

  if (check.kind === 'measure') {
    const typed = input.reading?.trim() ?? '';
    let value: number | null = null;
    let overRange = false;
    let evaluation: Evaluation;
    if (typed === '') {
      evaluation = evaluate(check.spec, null);
    } else {
      const parsed = parseReading(typed, check.quantity);
      if (!parsed.ok) return { ok: false, code: 'unreadable_reading', field: 'reading', message: parsed.message };
      value = parsed.value;
      overRange = parsed.overRange;
      evaluation = evaluate(check.spec, parsed, {
        accuracy: accuracyFor(ctx.meterRanges, check.quantity, check.meterFunction, check.range, parsed.value),
        ambientC: ctx.ambientC,
        readings: latestReadings(ctx.path),
      });
    }
    const walked = nextCheckId(document, check.id, { verdict: evaluation.verdict, leans: evaluation.leans }, (id) => visits.get(id) ?? 0);
    if (!walked.ok || walked.next === null) {
      return { ok: false, code: typed === '' ? 'reading_required' : 'no_outcome', field: 'reading', message: walked.ok ? 'This check has no next step.' : walked.message };
    }
    return { ok: true, value, overRange, verdict: evaluation.verdict, evaluation, choiceId: null, nextCheckId: walked.next };
  }

  const step: StepInput = check.kind === 'observe' ? { choiceId: input.choiceId ?? '' } : { done: true };
  if (check.kind === 'observe' && !input.choiceId) {
    return { ok: false, code: 'choice_required', field: 'choiceId', message: `Pick what you observed for “${check.title}”.` };
  }
  const walked = nextCheckId(document, check.id, step, (id) => visits.get(id) ?? 0);
  if (!walked.ok || walked.next === null) {
    return { ok: false, code: 'invalid_choice', field: 'choiceId', message: walked.ok ? 'This check has no next step.' : walked.message };
  }
  return { ok: true, value: null, overRange: false, verdict: null, evaluation: null, choiceId: check.kind === 'observe' ? input.choiceId! : null, nextCheckId: walked.next };
}

function countVisits(path: PathSoFar): Map<string, number> {
  const visits = new Map<string, number>();
  for (const s of path) visits.set(s.checkId, (visits.get(s.checkId) ?? 0) + 1);
  return visits;
}

function latestReadings(path: PathSoFar): Record<string, PriorReading> {
  const readings: Record<string, PriorReading> = {};
  for (const s of path) readings[s.checkId] = { value: s.value, overRange: s.overRange, uncertainty: s.uncertainty };
  return readings;
}
