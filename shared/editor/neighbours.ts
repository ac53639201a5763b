import type { ProcedureDocument } from '../engine/procedure';
import { edgesOf, incomingTo } from './edges';

export type Direction = 'up' | 'down' | 'left' | 'right';

/** Where each check's arrows lead, each target once, in outcome order. */
const targetsOf = (document: ProcedureDocument, id: string): string[] => {
  const check = document.checks.find((c) => c.id === id);
  return check ? [...new Set(edgesOf(check).map((e) => e.target))].filter((t) => t !== id) : [];
};

/**
 * The check to select when the keyboard moves from `id` along the diagram's arrows: down follows the first
 * outcome, up goes back to the first check that leads here, left and right step through the checks that this
 * check's parent leads to. Null when there is nowhere to go that way.
 */
export function neighbour(document: ProcedureDocument, id: string, direction: Direction): string | null {
  if (direction === 'down') return targetsOf(document, id)[0] ?? null;
  const parent = incomingTo(document, id).find((e) => e.ref.checkId !== id)?.ref.checkId ?? null;
  if (direction === 'up' || parent === null) return direction === 'up' ? parent : null;
  const siblings = targetsOf(document, parent);
  const at = siblings.indexOf(id);
  return siblings[at + (direction === 'right' ? 1 : -1)] ?? null;
}
