import { decide, readingUncertainty, type Decision, type Lean, type MeterAccuracy } from './accuracy';
import { copperFactor } from './copper';
import { QUANTITY_INFO, type Quantity } from './quantity';
import type { Spec } from './spec';
import type { Verdict } from './verdict';
import { wireResistance } from './wire';


/** The part of a parsed reading the evaluation needs; a `ParsedReading` fits. */
export interface ReadingValue {
  value: number | null;
  overRange: boolean;
  quantity: Quantity;
}

/** A reading taken earlier in the same diagnosis, with the half-width of its uncertainty when known. */
export interface PriorReading {
  value: number | null;
  overRange: boolean;
  uncertainty?: number;
}

export interface EvaluationContext {
  /** Accuracy of the meter on the function and range the reading was taken on. */
  accuracy?: MeterAccuracy;
  /** Ambient temperature, for specs quoted for copper at 20 °C and for wire resistance. */
  ambientC?: number;
  /** Latest reading of each earlier check, by check id. */
  readings?: Readonly<Record<string, PriorReading | undefined>>;
}

export interface Limits {
  min: number | null;
  max: number | null;
}

export interface Interval {
  low: number;
  high: number;
}

/**
 * A verdict with the numbers behind it, enough to say "520 Ω is above the 400–500 Ω window
 * (corrected to 32 °C)". For a ratio spec `compared`, `limits` and `interval` are ratios; otherwise SI values.
 */
export interface Evaluation {
  verdict: Verdict;
  /** For a marginal verdict, the limit its interval straddles. */
  leans: Lean | null;
  /** The value held against the limits; null when over range or absent. */
  compared: number | null;
  /** Limits actually used, after temperature correction. */
  limits: Limits;
  /** compared ± uncertainty. */
  interval: Interval | null;
  uncertainty: number;
  /** Ambient temperature the copper limits or wire resistance were corrected to; null when not corrected. */
  correctedToC: number | null;
  /** The earlier reading a ratio or agreement spec used. */
  reference: number | null;
  /** agree_with: earlier reading plus wire resistance. */
  expected: number | null;
  wireResistance: number | null;
}

const NO_CONTEXT: EvaluationContext = {};
const NO_LIMITS: Limits = { min: null, max: null };

/** Judge one reading against its spec. Pure and allocation-light: it runs for every step a technician submits. */
export function evaluate(spec: Spec, reading: ReadingValue | null, ctx: EvaluationContext = NO_CONTEXT): Evaluation {
  if (reading === null || !(reading.overRange || Number.isFinite(reading.value))) return noReading(NO_LIMITS);
  switch (spec.kind) {
    case 'window':
      return band(reading, spec.min, spec.max, spec.copperAt20C === true, ctx);
    case 'nominal': {
      const tol = spec.tolPct !== undefined ? (Math.abs(spec.nominal) * spec.tolPct) / 100 : (spec.tolAbs ?? 0);
      return band(reading, spec.nominal - tol, spec.nominal + tol, spec.copperAt20C === true, ctx);
    }
    case 'at_most':
      return band(reading, null, spec.max, spec.copperAt20C === true, ctx);
    case 'at_least':
      return band(reading, spec.min, null, spec.copperAt20C === true, ctx);
    case 'expect_continuity':
      return band(reading, null, spec.max, false, ctx);
    case 'expect_open':
      return expectOpen(reading, spec.openAbove ?? null, ctx);
    case 'record_only':
      return result('in_spec', null, reading.value, NO_LIMITS, 0, null, null, null, null);
    case 'ratio':
      return ratio(reading, ctx.readings?.[spec.pairWith], spec.minRatio, ctx);
    case 'agree_with': {
      const prior = ctx.readings?.[spec.checkId];
      const wire = spec.wire === undefined ? null : wireResistance(spec.wire, ctx.ambientC ?? 20);
      return agree(reading, prior, spec.tolAbs, spec.tolPct, wire, spec.wire !== undefined ? (ctx.ambientC ?? null) : null, ctx);
    }
  }
}

function band(reading: ReadingValue, min: number | null, max: number | null, copper: boolean, ctx: EvaluationContext): Evaluation {
  const correctedToC = copper && ctx.ambientC !== undefined ? ctx.ambientC : null;
  const factor = correctedToC === null ? 1 : copperFactor(correctedToC);
  const limits: Limits = { min: min === null ? null : min * factor, max: max === null ? null : max * factor };
  if (reading.value === null) {
    // Over range is above any lower limit; with an upper limit it is open (resistance, diode) or simply too high.
    const verdict = limits.max === null ? 'in_spec' : QUANTITY_INFO[reading.quantity].opensOnOverRange ? 'open' : 'high';
    return result(verdict, null, null, limits, 0, correctedToC, null, null, null);
  }
  const u = readingUncertainty(reading.value, ctx.accuracy);
  return decided(decide(reading.value, u, limits.min, limits.max), reading.value, limits, u, correctedToC, null, null, null);
}

function expectOpen(reading: ReadingValue, openAbove: number | null, ctx: EvaluationContext): Evaluation {
  const limits: Limits = { min: openAbove, max: null };
  if (reading.value === null) return result('in_spec', null, null, limits, 0, null, null, null, null);
  const u = readingUncertainty(reading.value, ctx.accuracy);
  if (openAbove === null) return result('low', null, reading.value, limits, u, null, null, null, null);
  return decided(decide(reading.value, u, openAbove, null), reading.value, limits, u, null, null, null, null);
}

function ratio(reading: ReadingValue, forward: PriorReading | undefined, minRatio: number, ctx: EvaluationContext): Evaluation {
  const limits: Limits = { min: minRatio, max: null };
  if (forward === undefined || !(forward.overRange || Number.isFinite(forward.value))) return noReading(limits);
  const reverse = reading.value;
  if (forward.value === null) {
    // Open both ways is an open part; open only on the forward side means the part reads backwards.
    return result(reverse === null ? 'open' : 'low', null, reverse === null ? null : 0, limits, 0, null, null, null, null);
  }
  const b = forward.value;
  if (reverse === null) return result('in_spec', null, null, limits, 0, null, b, null, null);
  if (b <= 0) return result(reverse <= 0 ? 'low' : 'in_spec', null, null, limits, 0, null, b, null, null);
  const r = reverse / b;
  // First-order propagation for a quotient: |dr| ≤ (U_reverse + |r|·U_forward) / |forward|.
  const u = (readingUncertainty(reverse, ctx.accuracy) + Math.abs(r) * (forward.uncertainty ?? 0)) / b;
  return decided(decide(r, u, minRatio, null), r, limits, u, null, b, null, null);
}

function agree(
  reading: ReadingValue,
  earlier: PriorReading | undefined,
  tolAbs: number | undefined,
  tolPct: number | undefined,
  wire: number | null,
  correctedToC: number | null,
  ctx: EvaluationContext,
): Evaluation {
  if (earlier === undefined || !(earlier.overRange || Number.isFinite(earlier.value))) return noReading(NO_LIMITS);
  if (earlier.value === null) {
    // Both ends open agree; a finite reading against an open earlier end reads lower than it.
    const verdict = reading.value === null ? 'in_spec' : 'low';
    return result(verdict, null, reading.value, NO_LIMITS, 0, correctedToC, null, null, wire);
  }
  const expected = earlier.value + (wire ?? 0);
  const tol = tolAbs ?? (Math.abs(expected) * (tolPct ?? 0)) / 100;
  const limits: Limits = { min: expected - tol, max: expected + tol };
  if (reading.value === null) {
    const verdict = QUANTITY_INFO[reading.quantity].opensOnOverRange ? 'open' : 'high';
    return result(verdict, null, null, limits, 0, correctedToC, earlier.value, expected, wire);
  }
  // Both readings carry meter error; add the half-widths (worst case) before deciding.
  const u = readingUncertainty(reading.value, ctx.accuracy) + (earlier.uncertainty ?? 0);
  return decided(decide(reading.value, u, limits.min, limits.max), reading.value, limits, u, correctedToC, earlier.value, expected, wire);
}

function decided(
  decision: Decision,
  compared: number,
  limits: Limits,
  u: number,
  correctedToC: number | null,
  reference: number | null,
  expected: number | null,
  wire: number | null,
): Evaluation {
  const verdict = decision === 'marginal_low' || decision === 'marginal_high' ? 'marginal' : decision;
  const leans = decision === 'marginal_low' ? 'low' : decision === 'marginal_high' ? 'high' : null;
  return result(verdict, leans, compared, limits, u, correctedToC, reference, expected, wire);
}

function noReading(limits: Limits): Evaluation {
  return result('no_reading', null, null, limits, 0, null, null, null, null);
}

/** Every evaluation has the same shape, which keeps the hot path monomorphic. */
function result(
  verdict: Verdict,
  leans: Lean | null,
  compared: number | null,
  limits: Limits,
  uncertainty: number,
  correctedToC: number | null,
  reference: number | null,
  expected: number | null,
  wire: number | null,
): Evaluation {
  return {
    verdict,
    leans,
    compared,
    limits,
    interval: compared === null ? null : { low: compared - uncertainty, high: compared + uncertainty },
    uncertainty,
    correctedToC,
    reference,
    expected,
    wireResistance: wire,
  };
}
