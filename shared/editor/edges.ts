import type { Check, ProcedureDocument } from '../engine/procedure';
import { VERDICTS } from '../engine/verdict';
import type { OutcomeRef } from './document-edits';

/** One way out of a check as drawn and edited: which outcome, its words, and where it leads. */
export interface Edge {
  ref: OutcomeRef;
  label: string;
  target: string;
}

export const VERDICT_LABELS = { in_spec: 'in spec', low: 'low', high: 'high', open: 'open', marginal: 'marginal', no_reading: 'no reading' } as const;

export function edgesOf(check: Check): Edge[] {
  switch (check.kind) {
    case 'measure':
      return VERDICTS.flatMap((verdict) => {
        const target = check.outcomes[verdict];
        return target === undefined ? [] : [{ ref: { checkId: check.id, verdict }, label: VERDICT_LABELS[verdict], target }];
      });
    case 'observe':
      return check.choices.map((c) => ({ ref: { checkId: check.id, choiceId: c.id }, label: c.label, target: c.next }));
    case 'task':
      return [{ ref: { checkId: check.id, next: true }, label: 'done', target: check.next }];
    case 'finding':
      return [];
  }
}

/** Checks that lead to `id`, for "reached from" lists. */
export function incomingTo(document: ProcedureDocument, id: string): Edge[] {
  return document.checks.flatMap((c) => edgesOf(c).filter((e) => e.target === id));
}
