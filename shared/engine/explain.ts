import type { Evaluation } from './evaluate';
import type { Quantity } from './quantity';
import type { Spec } from './spec';
import { formatValue } from './units';

/**
 * One sentence for the technician from an evaluation, e.g. "520 Ω is above the 400–500 Ω window
 * (corrected to 32 °C)." Client and server word verdicts the same way.
 */
export function explainEvaluation(spec: Spec, evaluation: Evaluation, quantity: Quantity): string {
  const fmt = (v: number) => formatValue(v, quantity);
  const { verdict, compared, limits } = evaluation;
  const corrected = evaluation.correctedToC === null ? '' : ` (corrected to ${formatValue(evaluation.correctedToC, 'temperature')})`;
  const margin = evaluation.uncertainty > 0 ? `, ±${spec.kind === 'ratio' ? ratioText(evaluation.uncertainty) : fmt(evaluation.uncertainty)} meter uncertainty` : '';

  if (verdict === 'no_reading') {
    return spec.kind === 'ratio' || spec.kind === 'agree_with'
      ? `No earlier reading from “${spec.kind === 'ratio' ? spec.pairWith : spec.checkId}” to compare with.`
      : 'No reading to judge.';
  }
  if (spec.kind === 'record_only') return compared === null ? 'Recorded: OL (over range).' : `Recorded: ${fmt(compared)}.`;

  if (spec.kind === 'ratio') {
    if (verdict === 'open') return 'OL both ways: the part is open.';
    if (compared === null) {
      return verdict === 'in_spec' ? 'OL in reverse against a forward reading: it blocks one way, as it should.' : 'Both readings are at or below zero: the part is shorted.';
    }
    if (compared === 0) return 'OL forward but a reading in reverse: the part reads backwards.';
    return `Reverse/forward ratio ${ratioText(compared)} ${relation(verdict, 'meets')} the minimum of ${ratioText(limits.min ?? 0)}${margin}.`;
  }

  const target = spec.kind === 'agree_with' ? agreementText(evaluation, fmt) : limitsText(limits.min, limits.max, fmt);
  if (compared === null) {
    if (spec.kind === 'expect_open') return 'OL: open, as expected.';
    if (verdict === 'in_spec') return `OL (over range): meets ${target}.`;
    return verdict === 'open' ? `OL: open circuit against ${target}${corrected}.` : `Over range: above ${target}${corrected}.`;
  }
  if (spec.kind === 'expect_open') {
    return limits.min === null
      ? `${fmt(compared)}: a reading where an open circuit (OL) is expected.`
      : `${fmt(compared)} ${relation(verdict, 'meets')} ${target}${margin}.`;
  }
  const passing = spec.kind === 'agree_with' ? 'agrees with' : limits.min !== null && limits.max !== null ? 'is within' : 'meets';
  return `${fmt(compared)} ${relation(verdict, passing)} ${target}${corrected}${margin}.`;
}

function relation(verdict: Evaluation['verdict'], passing: string): string {
  switch (verdict) {
    case 'in_spec':
      return passing;
    case 'low':
      return 'is below';
    case 'high':
      return 'is above';
    default:
      return 'is too close to call against';
  }
}

function limitsText(min: number | null, max: number | null, fmt: (v: number) => string): string {
  if (min !== null && max !== null) return `the ${rangeText(min, max, fmt)} window`;
  if (max !== null) return `the maximum of ${fmt(max)}`;
  return `the minimum of ${fmt(min ?? 0)}`;
}

function agreementText(evaluation: Evaluation, fmt: (v: number) => string): string {
  const { limits, reference, wireResistance } = evaluation;
  const window = limits.min !== null && limits.max !== null ? `: ${rangeText(limits.min, limits.max, fmt)}` : '';
  const wire = wireResistance === null ? '' : ` plus ${fmt(wireResistance)} of wire`;
  return reference === null ? 'the earlier reading' : `the earlier ${fmt(reference)}${wire}${window}`;
}

/** "400–500 Ω" when both ends share a prefix, else "800 mΩ–1.20 Ω". */
function rangeText(min: number, max: number, fmt: (v: number) => string): string {
  const low = fmt(min);
  const high = fmt(max);
  const unit = high.slice(high.indexOf(' '));
  return low.endsWith(unit) ? `${low.slice(0, -unit.length)}–${high}` : `${low}–${high}`;
}

function ratioText(value: number): string {
  return Number(value.toPrecision(3)).toString();
}
