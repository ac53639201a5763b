import type { StepView } from '@shared/api/diagnosis-types';
import type { PriorReading } from '@shared/engine/evaluate';

/** Pure helpers for stepping through a concluded diagnosis. */

/** Time spent on each step: from the step before it (or the start) to its own recording, in ms. */
export function stepDurations(startedAt: string, steps: readonly Pick<StepView, 'recordedAt'>[]): number[] {
  let previous = Date.parse(startedAt);
  return steps.map((s) => {
    const at = Date.parse(s.recordedAt);
    const spent = Math.max(0, at - previous);
    previous = at;
    return spent;
  });
}

const MINUTE = 60_000;

/** "under a minute", "7 min", "1 h 05 min", "2 d 4 h": short enough for a step header. */
export function formatDuration(ms: number): string {
  const minutes = Math.round(ms / MINUTE);
  if (minutes < 1) return 'under a minute';
  if (minutes < 60) return `${minutes} min`;
  const hours = Math.floor(minutes / 60);
  if (hours < 24) return `${hours} h ${String(minutes % 60).padStart(2, '0')} min`;
  return `${Math.floor(hours / 24)} d ${hours % 24} h`;
}

export interface ReplayPath {
  /** Checks the path visited, the finding included. */
  visited: Set<string>;
  /** Arrows the path took, as "from→to". */
  taken: Set<string>;
  /** Arrows of steps that were taken back: the detours. */
  detours: Set<string>;
}

export const edgeKey = (from: string, to: string) => `${from}→${to}`;

/** The path through the procedure up to and including step `upTo` (an index into `steps`; all when omitted). */
export function replayPath(steps: readonly Pick<StepView, 'checkId' | 'nextCheckId' | 'retracted'>[], upTo = steps.length - 1): ReplayPath {
  const path: ReplayPath = { visited: new Set(), taken: new Set(), detours: new Set() };
  for (const step of steps.slice(0, upTo + 1)) {
    path.visited.add(step.checkId);
    if (step.nextCheckId === null) continue;
    if (step.retracted) path.detours.add(edgeKey(step.checkId, step.nextCheckId));
    else {
      path.taken.add(edgeKey(step.checkId, step.nextCheckId));
      path.visited.add(step.nextCheckId);
    }
  }
  return path;
}

/** The latest reading of each check before step `index`, steps taken back left out, as the engine saw them. */
export function earlierReadings(steps: readonly Pick<StepView, 'checkId' | 'valueSi' | 'overRange' | 'evaluation' | 'retracted'>[], index: number): Record<string, PriorReading> {
  const readings: Record<string, PriorReading> = {};
  for (const s of steps.slice(0, index)) {
    if (!s.retracted) readings[s.checkId] = { value: s.valueSi, overRange: s.overRange, uncertainty: s.evaluation?.uncertainty };
  }
  return readings;
}
