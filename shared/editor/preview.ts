import { decideStep, type PathSoFar, type StepDecision } from '../diagnosis/decide-step';
import type { ProcedureDocument } from '../engine/procedure';
import type { MeterRange } from '../workshop/schemas';

/**
 * A typical 6000-count handheld meter (common practice for a shop meter's accuracy class, not any one
 * model's table): the preview judges readings against it so marginal calls look as they will at the bench.
 */
const r = (fn: MeterRange['function'], rangeMax: number, resolution: number, pctOfReading: number, counts: number): MeterRange => ({
  function: fn,
  rangeMax,
  resolution,
  pctOfReading,
  counts,
});

export const PREVIEW_METER: readonly MeterRange[] = [
  ...[600, 6_000, 60_000, 600_000, 6_000_000].map((max) => r('ohms', max, max / 6000, 0.9, 3)),
  r('continuity', 600, 0.1, 0.9, 3),
  r('diode', 3, 0.001, 1.0, 3),
  ...[6, 60, 600].map((max) => r('dc_volts', max, max / 6000, 0.5, 2)),
  ...[6, 60, 600].map((max) => r('ac_volts', max, max / 6000, 1.0, 3)),
  r('dc_amps', 0.06, 0.00001, 1.0, 3),
  r('dc_amps', 10, 0.01, 1.5, 3),
  r('ac_amps', 10, 0.01, 2.0, 3),
  r('frequency', 10_000, 1, 0.1, 2),
  r('temperature', 400, 1, 1.0, 3),
];

/** Ambient temperature the preview assumes; copper windings are corrected to it as at the bench. */
export const PREVIEW_AMBIENT_C = 20;

export interface PreviewStep {
  checkId: string;
  typed: string;
  decision: Extract<StepDecision, { ok: true }>;
}

/** One step of a walk through the draft, decided exactly as a diagnosis would decide it; nothing is recorded. */
export function previewStep(document: ProcedureDocument, steps: readonly PreviewStep[], checkId: string, input: { reading?: string; choiceId?: string }): StepDecision {
  const path: PathSoFar = steps.map((s) => ({ checkId: s.checkId, value: s.decision.value, overRange: s.decision.overRange, uncertainty: s.decision.evaluation?.uncertainty }));
  return decideStep(document, checkId, input, { meterRanges: PREVIEW_METER, ambientC: PREVIEW_AMBIENT_C, path });
}
