import type { Check, CheckKind, ProcedureDocument } from '../engine/procedure';
import type { Verdict } from '../engine/verdict';

/** Edits of a draft document. Each returns a new document and leaves its input untouched (undo keeps both). */

/** Where an outcome leaves a check: a verdict of a measure check, a choice id of an observation, or a task's next step. */
export type OutcomeRef = { checkId: string; verdict: Verdict } | { checkId: string; choiceId: string } | { checkId: string; next: true };

export function newCheckId(document: ProcedureDocument, kind: CheckKind): string {
  const taken = new Set(document.checks.map((c) => c.id));
  let n = document.checks.length + 1;
  while (taken.has(`${kind}-${n}`)) n++;
  return `${kind}-${n}`;
}

/** Where an outcome currently leads, if it is set. */
export function targetOf(document: ProcedureDocument, ref: OutcomeRef): string | undefined {
  const check = document.checks.find((c) => c.id === ref.checkId);
  if (!check) return undefined;
  if ('verdict' in ref) return check.kind === 'measure' ? check.outcomes[ref.verdict] : undefined;
  if ('choiceId' in ref) return check.kind === 'observe' ? check.choices.find((c) => c.id === ref.choiceId)?.next : undefined;
  return check.kind === 'task' ? check.next : undefined;
}

export function setOutcome(document: ProcedureDocument, ref: OutcomeRef, target: string | null): ProcedureDocument {
  return mapCheck(document, ref.checkId, (check) => {
    if ('verdict' in ref && check.kind === 'measure') {
      const outcomes = { ...check.outcomes };
      if (target === null) delete outcomes[ref.verdict];
      else outcomes[ref.verdict] = target;
      return { ...check, outcomes };
    }
    if ('choiceId' in ref && check.kind === 'observe' && target !== null) {
      return { ...check, choices: check.choices.map((c) => (c.id === ref.choiceId ? { ...c, next: target } : c)) };
    }
    if ('next' in ref && check.kind === 'task' && target !== null) return { ...check, next: target };
    return check;
  });
}

/**
 * A new check of `kind`. Placed on an outcome (`at`), it takes that outcome's place and its own way on
 * leads where the outcome used to; on its own, it leads to the first finding. A new check is deliberately
 * incomplete (no spec limits, missing outcomes) so validation lists what to fill in.
 */
export function addCheck(document: ProcedureDocument, kind: CheckKind, at?: OutcomeRef): { document: ProcedureDocument; id: string } {
  const id = newCheckId(document, kind);
  const onward = (at ? targetOf(document, at) : undefined) ?? document.checks.find((c) => c.kind === 'finding')?.id ?? id;
  const check = blankCheck(id, kind, onward);
  let next: ProcedureDocument = { ...document, checks: [...document.checks, check] };
  if (at) next = setOutcome(next, at, id);
  return { document: next, id };
}

function blankCheck(id: string, kind: CheckKind, onward: string): Check {
  const base = { id, instruction: '' };
  switch (kind) {
    case 'measure':
      return { ...base, kind, title: 'New measurement', quantity: 'resistance', meterFunction: 'ohms', spec: { kind: 'window', min: 0, max: 0, unit: 'Ω' }, outcomes: { in_spec: onward } };
    case 'observe':
      return {
        ...base,
        kind,
        title: 'New observation',
        choices: [
          { id: 'seen', label: 'Seen', next: onward },
          { id: 'not-seen', label: 'Not seen', next: onward },
        ],
      };
    case 'task':
      return { ...base, kind, title: 'New task', next: onward };
    case 'finding':
      return { ...base, kind, title: 'New finding', finding: { part: 'Name the part', action: 'Say what to do' } };
  }
}

/**
 * Removes a check. Outcomes that led to it are left pointing at its id, so validation flags each one for
 * the author to re-point. The last check can't go: a procedure has at least one.
 */
export function deleteCheck(document: ProcedureDocument, id: string): ProcedureDocument {
  const checks = document.checks.filter((c) => c.id !== id);
  if (checks.length === 0 || checks.length === document.checks.length) return document;
  return { ...document, checks, startCheckId: document.startCheckId === id ? checks[0].id : document.startCheckId };
}

export function replaceCheck(document: ProcedureDocument, id: string, check: Check): ProcedureDocument {
  return mapCheck(document, id, () => check);
}

export function setStart(document: ProcedureDocument, id: string): ProcedureDocument {
  return document.checks.some((c) => c.id === id) ? { ...document, startCheckId: id } : document;
}

function mapCheck(document: ProcedureDocument, id: string, change: (check: Check) => Check): ProcedureDocument {
  let changed = false;
  const checks = document.checks.map((c) => {
    if (c.id !== id) return c;
    const next = change(c);
    if (next !== c) changed = true;
    return next;
  });
  return changed ? { ...document, checks } : document;
}
