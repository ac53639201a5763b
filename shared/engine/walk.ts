import type { Lean } from './accuracy';
import { marginalPolicyOf } from './outcomes';
import type { Check, ProcedureDocument } from './procedure';
import type { Verdict } from './verdict';

/** What the technician's step produced: a verdict (measure), a picked choice (observe) or "done" (task). */
export type StepInput = { verdict: Verdict; leans?: Lean | null } | { choiceId: string } | { done: true };

export type WalkResult =
  | {
      ok: true;
      /** The check to show next; null when the current check is a finding (the diagnosis can conclude). */
      next: string | null;
      /** The outcome followed: a verdict after the marginal policy, a choice id, or "next". */
      via: string;
      /** A re-test check that was skipped because its visits were used up; its `whenExhausted` was taken instead. */
      exhausted: string | null;
    }
  | { ok: false; message: string };

const indexes = new WeakMap<readonly Check[], Map<string, Check>>();

/**
 * Checks by id. Documents are treated as immutable values (a published version never changes and a saved
 * draft is a new object), so the index is built once per checks array.
 */
function checkIndex(document: ProcedureDocument): Map<string, Check> {
  let index = indexes.get(document.checks);
  if (index === undefined) {
    index = new Map();
    for (const check of document.checks) if (!index.has(check.id)) index.set(check.id, check);
    indexes.set(document.checks, index);
  }
  return index;
}

const NEVER_VISITED = (): number => 0;

/**
 * The check that follows `fromCheckId` given the step's result. `visits` says how many times a check has
 * already run in this diagnosis (retracted steps excluded); it enforces re-test limits.
 */
export function nextCheckId(
  document: ProcedureDocument,
  fromCheckId: string,
  step: StepInput,
  visits: (checkId: string) => number = NEVER_VISITED,
): WalkResult {
  const index = checkIndex(document);
  const check = index.get(fromCheckId);
  if (check === undefined) return { ok: false, message: `There is no check “${fromCheckId}” in this procedure version.` };

  let target: string | undefined;
  let via: string;
  switch (check.kind) {
    case 'finding':
      return { ok: true, next: null, via: 'finding', exhausted: null };
    case 'task':
      if (!('done' in step)) return { ok: false, message: `“${check.title}” is a task: mark it done to go on.` };
      target = check.next;
      via = 'next';
      break;
    case 'observe': {
      if (!('choiceId' in step)) return { ok: false, message: `“${check.title}” needs one of its observations picked.` };
      const choice = check.choices.find((c) => c.id === step.choiceId);
      if (choice === undefined) return { ok: false, message: `“${step.choiceId}” is not one of the observations of “${check.title}”.` };
      target = choice.next;
      via = choice.id;
      break;
    }
    case 'measure': {
      if (!('verdict' in step)) return { ok: false, message: `“${check.title}” needs a reading.` };
      let outcome: Verdict = step.verdict;
      if (outcome === 'marginal') {
        const policy = marginalPolicyOf(check, document);
        if (policy === 'pass') outcome = 'in_spec';
        else if (policy === 'fail') {
          if (step.leans == null) return { ok: false, message: 'A marginal verdict needs the side it leans to.' };
          outcome = step.leans;
        }
      }
      target = check.outcomes[outcome];
      via = outcome;
      if (target === undefined) {
        return {
          ok: false,
          message:
            outcome === 'no_reading'
              ? `“${check.title}” needs a reading; this procedure has no way on without one.`
              : `“${check.title}” has no outcome for ${outcome.replace('_', ' ')}. Ask a lead to fix the procedure.`,
        };
      }
      break;
    }
  }

  const next = index.get(target);
  if (next === undefined) return { ok: false, message: `The procedure leads to a missing check “${target}”. Ask a lead to fix it.` };
  if (next.kind !== 'finding' && next.retest !== undefined && visits(next.id) >= next.retest.maxVisits) {
    return { ok: true, next: next.retest.whenExhausted, via, exhausted: next.id };
  }
  return { ok: true, next: next.id, via, exhausted: null };
}
