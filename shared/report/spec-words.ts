import type { Evaluation } from '../engine/evaluate';
import type { Quantity } from '../engine/quantity';
import type { Spec } from '../engine/spec';
import { formatValue } from '../engine/units';

/**
 * A spec in a few words for a customer's report: "400–500 Ω", "at most 0.5 V",
 * "open circuit (OL)". With an evaluation, the limits are the ones actually
 * used (corrected to the ambient temperature, or built from an earlier reading).
 */
export function specInWords(spec: Spec, quantity: Quantity, evaluation: Evaluation | null): string {
  const fmt = (v: number) => formatValue(v, quantity);
  const min = evaluation ? evaluation.limits.min : 'min' in spec ? spec.min : null;
  const max = evaluation ? evaluation.limits.max : 'max' in spec ? spec.max : null;
  const corrected = evaluation?.correctedToC != null ? ` at ${formatValue(evaluation.correctedToC, 'temperature')}` : '';
  switch (spec.kind) {
    case 'record_only':
      return 'Recorded for reference; no spec';
    case 'expect_open':
      return 'Open circuit (OL)';
    case 'expect_continuity':
      return `Continuity: at most ${fmt(spec.max)}`;
    case 'ratio':
      return `Reverse reading at least ${spec.minRatio}× the forward reading`;
    case 'agree_with':
      return min !== null && max !== null ? `Agrees with the earlier reading: ${range(min, max, fmt)}` : 'Agrees with the earlier reading';
    default:
      if (min !== null && max !== null) return `${range(min, max, fmt)}${corrected}`;
      if (max !== null) return `At most ${fmt(max)}${corrected}`;
      return `At least ${fmt(min ?? 0)}${corrected}`;
  }
}

/** "400–500 Ω" when both ends share a unit, else "800 mΩ–1.20 Ω". */
function range(min: number, max: number, fmt: (v: number) => string): string {
  const low = fmt(min);
  const high = fmt(max);
  const unit = high.slice(high.indexOf(' '));
  return low.endsWith(unit) ? `${low.slice(0, -unit.length)}–${high}` : `${low}–${high}`;
}
