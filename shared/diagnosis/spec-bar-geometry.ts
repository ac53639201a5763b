import { readingUncertainty } from '../engine/accuracy';
import { evaluate, type Evaluation, type EvaluationContext, type PriorReading } from '../engine/evaluate';
import type { MeasureCheck } from '../engine/procedure';
import { QUANTITY_INFO, type Quantity } from '../engine/quantity';
import type { Spec, SpecKind } from '../engine/spec';
import type { MeterRange } from '../workshop/schemas';
import { accuracyFor } from './meter-accuracy';

/**
 * The spec bar's geometry, free of drawing: which stretch of the scale to show, where the acceptance window,
 * the marginal bands and the reading fall on it. Positions are fractions of the scale (0 = left end,
 * 1 = right end); over range (OL) has its own zone past the right end.
 */

export interface Span {
  from: number;
  to: number;
}

export interface LimitMark {
  side: 'min' | 'max';
  /** In the units compared: SI, or a ratio for a ratio spec. */
  value: number;
  at: number;
}

export interface MarginalBand extends Span {
  side: 'min' | 'max';
}

export type Marker =
  | { kind: 'value'; value: number; at: number; beyond: 'low' | 'high' | null; interval: Span | null }
  | { kind: 'over_range' };

export interface SpecBarGeometry {
  scaleMin: number;
  scaleMax: number;
  /** Evenly spaced round values, ends included. */
  ticks: { value: number; at: number }[];
  /** The acceptance window on the scale; a side without a limit runs to the scale's end. */
  window: Span | null;
  limits: LimitMark[];
  /** Either side of each limit: a reading here is too close to call with this meter. */
  bands: MarginalBand[];
  /** Whether OL (over range) meets the spec, so the zone past the end is part of the window. */
  overRangePasses: boolean;
  marker: Marker | null;
}

/** Over range meets these specs (nothing above the limit matters); on the others it is open or high. */
const OVER_RANGE_PASSES: Record<SpecKind, boolean> = {
  window: false,
  nominal: false,
  at_most: false,
  at_least: true,
  expect_open: true,
  expect_continuity: false,
  record_only: true,
  ratio: true,
  agree_with: false,
};

/** A reading further than this many scale widths outside is pinned to the end instead of stretching the scale. */
const STRETCH_LIMIT = 2;
const FIXED_POINT_ROUNDS = 8;

/**
 * The spec's limits as `evaluate` applies them (temperature-corrected, or built from an earlier reading),
 * before there is a reading: an evaluation with verdict `no_reading` and nothing compared.
 */
export function windowOnly(spec: Spec, quantity: Quantity, ctx: EvaluationContext): Evaluation {
  // Limits never depend on the reading's value; any finite probe value brings them out.
  const probe = evaluate(spec, { value: 1, overRange: false, quantity }, ctx);
  return { ...probe, verdict: 'no_reading', leans: null, compared: null, interval: null, uncertainty: 0 };
}

/**
 * Half-width of the meter's uncertainty for a value compared against this check's spec, taken from the
 * meter's accuracy table: for a ratio the quotient's propagated uncertainty, for an agreement the earlier
 * reading's uncertainty added.
 */
export function checkUncertainty(
  check: Pick<MeasureCheck, 'spec' | 'quantity' | 'meterFunction' | 'range'>,
  meterRanges: readonly MeterRange[],
  readings: Readonly<Record<string, PriorReading | undefined>> = {},
): (value: number) => number {
  const u = (x: number) => readingUncertainty(x, accuracyFor(meterRanges, check.quantity, check.meterFunction, check.range, x));
  const spec = check.spec;
  if (spec.kind === 'ratio') {
    const forward = readings[spec.pairWith];
    const b = forward?.value;
    if (b == null || b <= 0) return () => 0;
    return (r) => (u(r * b) + Math.abs(r) * (forward?.uncertainty ?? 0)) / b;
  }
  if (spec.kind === 'agree_with') {
    const earlier = readings[spec.checkId]?.uncertainty ?? 0;
    return (x) => u(x) + earlier;
  }
  return u;
}

/**
 * Where everything sits on the bar. `uncertaintyAt` gives the meter's half-width for a value; without it
 * the evaluation's own uncertainty stands in at each limit. Null when the spec has no limit to draw
 * (record only, or an agreement with nothing to agree with yet).
 */
export function specBarGeometry(
  spec: Spec,
  quantity: Quantity,
  evaluation: Evaluation,
  uncertaintyAt?: (value: number) => number,
): SpecBarGeometry | null {
  const { min, max } = evaluation.limits;
  if (min === null && max === null) return null;
  const signed = spec.kind !== 'ratio' && QUANTITY_INFO[quantity].signed;
  const uAt = uncertaintyAt ?? (evaluation.uncertainty > 0 ? () => evaluation.uncertainty : null);

  const bandEdges: MarginalBandValues[] = [];
  if (uAt) {
    if (min !== null) bandEdges.push({ side: 'min', ...bandAround(min, uAt) });
    if (max !== null) bandEdges.push({ side: 'max', ...bandAround(max, uAt) });
  }

  // A ratio reads from zero up to well past its minimum; other limits sit mid-scale.
  let [lo, hi] = spec.kind === 'ratio' && min !== null ? [0, 2 * min] : baseScale(min, max, signed);
  for (const b of bandEdges) {
    const pad = (b.high - b.low) * 0.5;
    lo = Math.min(lo, b.low - pad);
    hi = Math.max(hi, b.high + pad);
  }

  const reading = readingOf(spec, evaluation);
  if (typeof reading === 'number') {
    const width = hi - lo;
    if (reading >= lo - STRETCH_LIMIT * width && reading <= hi + STRETCH_LIMIT * width) {
      const pad = width * 0.08;
      lo = Math.min(lo, reading - pad);
      hi = Math.max(hi, reading + pad);
    }
  }
  if (!signed) lo = Math.max(lo, 0);

  const step = niceStep((hi - lo) / 4);
  const scaleMin = Math.floor(lo / step) * step;
  const scaleMax = Math.ceil(hi / step) * step;
  const at = (v: number) => clamp01((v - scaleMin) / (scaleMax - scaleMin));

  const ticks: SpecBarGeometry['ticks'] = [];
  const count = Math.round((scaleMax - scaleMin) / step);
  for (let i = 0; i <= count; i++) {
    const value = roundTo(scaleMin + i * step, step);
    ticks.push({ value, at: at(value) });
  }

  const limits: LimitMark[] = [];
  if (min !== null) limits.push({ side: 'min', value: min, at: at(min) });
  if (max !== null) limits.push({ side: 'max', value: max, at: at(max) });

  const overRangePasses = OVER_RANGE_PASSES[spec.kind];
  return {
    scaleMin,
    scaleMax,
    ticks,
    window: { from: min === null ? 0 : at(min), to: max === null ? 1 : at(max) },
    limits,
    bands: bandEdges.map((b) => ({ side: b.side, from: at(b.low), to: at(b.high) })),
    overRangePasses,
    marker: markerFor(reading, evaluation, at, scaleMin, scaleMax),
  };
}

interface MarginalBandValues {
  side: 'min' | 'max';
  low: number;
  high: number;
}

/**
 * The values around a limit whose uncertainty interval straddles it: from the x with x + u(x) = limit up
 * to the x with x − u(x) = limit. u grows slowly with x (a percentage of the reading), so a few rounds
 * of fixed-point iteration settle both ends.
 */
export function bandAround(limit: number, uncertaintyAt: (value: number) => number): { low: number; high: number } {
  let low = limit;
  let high = limit;
  for (let i = 0; i < FIXED_POINT_ROUNDS; i++) {
    low = limit - uncertaintyAt(low);
    high = limit + uncertaintyAt(high);
  }
  return { low, high };
}

/** The stretch shown before the reading and the bands are taken into account. */
function baseScale(min: number | null, max: number | null, signed: boolean): [number, number] {
  if (min !== null && max !== null) {
    const span = max - min || Math.abs(max) || 1;
    return [min - 0.6 * span, max + 0.6 * span];
  }
  if (min !== null) {
    const m = Math.abs(min) || 1;
    return [min - 0.3 * m, min + 0.3 * m];
  }
  const m = Math.abs(max!) || 1;
  return max! > 0 || !signed ? [0, 2 * m] : [max! - m, max! + m];
}

/** The compared value, 'over' for OL, or null when nothing was read (or a ratio has no quotient). */
function readingOf(spec: Spec, evaluation: Evaluation): number | 'over' | null {
  if (evaluation.verdict === 'no_reading') return null;
  if (evaluation.compared !== null) return evaluation.compared;
  // A ratio without a quotient is either OL in reverse (over) or a shorted part (nothing to place).
  if (spec.kind === 'ratio') return evaluation.reference !== null && evaluation.reference <= 0 ? null : 'over';
  return 'over';
}

function markerFor(
  reading: number | 'over' | null,
  evaluation: Evaluation,
  at: (v: number) => number,
  scaleMin: number,
  scaleMax: number,
): Marker | null {
  if (reading === null) return null;
  if (reading === 'over') return { kind: 'over_range' };
  const beyond = reading < scaleMin ? 'low' : reading > scaleMax ? 'high' : null;
  const interval = evaluation.interval && evaluation.uncertainty > 0 ? { from: at(evaluation.interval.low), to: at(evaluation.interval.high) } : null;
  return { kind: 'value', value: reading, at: at(reading), beyond, interval };
}

/** 1, 2 or 5 times a power of ten, at least `raw`. */
export function niceStep(raw: number): number {
  if (!(raw > 0) || !Number.isFinite(raw)) return 1;
  const power = 10 ** Math.floor(Math.log10(raw));
  const f = raw / power;
  return (f <= 1 ? 1 : f <= 2 ? 2 : f <= 5 ? 5 : 10) * power;
}

/** Removes binary noise from multiples of a decimal step (0.1 + 0.2 → 0.3). */
function roundTo(value: number, step: number): number {
  const decimals = Math.max(0, -Math.floor(Math.log10(step)) + 1);
  return Number(value.toFixed(Math.min(decimals, 15)));
}

function clamp01(x: number): number {
  return x < 0 ? 0 : x > 1 ? 1 : x;
}
