import type { Check, ProcedureDocument } from '../engine/procedure';
import { edgesOf } from './edges';

/** What changed between two versions of a procedure, for the side-by-side comparison. */
export interface VersionDiff {
  added: Check[];
  removed: Check[];
  changed: { id: string; title: string; fields: FieldChange[] }[];
  /** Outcomes of checks in both versions that now lead somewhere else (or appeared, or went). */
  repointed: { checkId: string; outcome: string; before: string | null; after: string | null }[];
  /** Procedure-wide fields: start check, cautions, marginal policy. */
  procedure: FieldChange[];
}

export interface FieldChange {
  field: string;
  before: string | null;
  after: string | null;
}

export function diffVersions(before: ProcedureDocument, after: ProcedureDocument): VersionDiff {
  const old = new Map(before.checks.map((c) => [c.id, c]));
  const now = new Map(after.checks.map((c) => [c.id, c]));
  const diff: VersionDiff = {
    added: after.checks.filter((c) => !old.has(c.id)),
    removed: before.checks.filter((c) => !now.has(c.id)),
    changed: [],
    repointed: [],
    procedure: compareFields(
      { startCheckId: before.startCheckId, cautions: before.cautions, marginalPolicy: before.marginalPolicy },
      { startCheckId: after.startCheckId, cautions: after.cautions, marginalPolicy: after.marginalPolicy },
    ),
  };
  for (const check of after.checks) {
    const was = old.get(check.id);
    if (!was) continue;
    const fields = compareFields(contentOf(was), contentOf(check));
    if (fields.length) diff.changed.push({ id: check.id, title: check.title, fields });
    const outcomesBefore = outcomeMap(was);
    const outcomesAfter = outcomeMap(check);
    for (const outcome of new Set([...outcomesBefore.keys(), ...outcomesAfter.keys()])) {
      const b = outcomesBefore.get(outcome) ?? null;
      const a = outcomesAfter.get(outcome) ?? null;
      if (a !== b) diff.repointed.push({ checkId: check.id, outcome, before: b, after: a });
    }
  }
  return diff;
}

export const isUnchanged = (d: VersionDiff) =>
  !d.added.length && !d.removed.length && !d.changed.length && !d.repointed.length && !d.procedure.length;

function outcomeMap(check: Check): Map<string, string> {
  return new Map(edgesOf(check).map((e) => [e.label, e.target]));
}

/** The check without its ways out (those are compared as re-pointed outcomes); choices keyed by id. */
function contentOf(check: Check): Record<string, unknown> {
  const content: Record<string, unknown> = { ...check };
  delete content.id;
  if (check.kind === 'measure') delete content.outcomes;
  if (check.kind === 'task') delete content.next;
  if (check.kind === 'observe') content.choices = Object.fromEntries(check.choices.map((c) => [c.id, c.label]));
  return content;
}

function compareFields(before: Record<string, unknown>, after: Record<string, unknown>): FieldChange[] {
  const a = flatten(before);
  const b = flatten(after);
  const changes: FieldChange[] = [];
  for (const field of new Set([...a.keys(), ...b.keys()])) {
    const was = a.get(field) ?? null;
    const is = b.get(field) ?? null;
    if (was !== is) changes.push({ field, before: was, after: is });
  }
  return changes;
}

/** Leaf values by dotted path ("spec.min", "probe.pins"); arrays of text are compared whole. */
function flatten(value: unknown, prefix = '', into = new Map<string, string>()): Map<string, string> {
  if (value === undefined || value === null) return into;
  if (Array.isArray(value)) {
    if (value.length) into.set(prefix, value.map((v) => (typeof v === 'object' ? JSON.stringify(v) : String(v))).join(' · '));
  } else if (typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) flatten(v, prefix ? `${prefix}.${k}` : k, into);
  } else {
    into.set(prefix, String(value));
  }
  return into;
}
