/**
 * Meter accuracy and the guard-band decision rule (JCGM 106:2012; ILAC-G8): a reading is only called in or
 * out of spec when its whole uncertainty interval is on one side of each limit. An interval that straddles a
 * limit is `marginal` — the meter's own error could flip the call.
 */

/** A meter's stated accuracy on the function and range in use: ±(% of reading + counts). */
export interface MeterAccuracy {
  pctOfReading: number;
  counts: number;
  /** Value of one count (one step of the last digit) on the range in use, in SI units. */
  resolution: number;
}

/** One count on a range: a 6000-count meter on its 600.0 V range resolves 0.1 V. */
export function resolutionFor(rangeFullScale: number, displayCounts: number): number {
  return rangeFullScale / displayCounts;
}

/** Half-width of the uncertainty interval of a reading: |x|·pct/100 + counts·resolution. */
export function readingUncertainty(value: number, accuracy: MeterAccuracy | undefined): number {
  if (accuracy === undefined) return 0;
  return (Math.abs(value) * accuracy.pctOfReading) / 100 + accuracy.counts * accuracy.resolution;
}

export type Lean = 'low' | 'high';

/** Outcome of comparing an interval with limits; the marginal cases say which limit they straddle. */
export type Decision = 'in_spec' | 'low' | 'high' | 'marginal_low' | 'marginal_high';

/**
 * Guard-banded comparison of value ± halfWidth with [min, max] (either side may be absent). Limits are
 * inclusive: a value exactly on a limit with no uncertainty is in spec.
 */
export function decide(value: number, halfWidth: number, min: number | null, max: number | null): Decision {
  const low = value - halfWidth;
  const high = value + halfWidth;
  if (min !== null && high < min) return 'low';
  if (max !== null && low > max) return 'high';
  const straddlesMin = min !== null && low < min;
  const straddlesMax = max !== null && high > max;
  if (straddlesMin && straddlesMax) {
    // Interval wider than the window: lean to the limit the reading sits nearer.
    return value - min < max - value ? 'marginal_low' : 'marginal_high';
  }
  if (straddlesMin) return 'marginal_low';
  if (straddlesMax) return 'marginal_high';
  return 'in_spec';
}
