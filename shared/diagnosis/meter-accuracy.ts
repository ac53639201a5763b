import type { MeterAccuracy } from '../engine/accuracy';
import { QUANTITY_INFO, type MeterFunction, type Quantity } from '../engine/quantity';
import type { MeterRange } from '../workshop/schemas';

/**
 * The accuracy that applies to a reading: the row of the meter's table for
 * the check's function and range, or — when the check leaves the range to the
 * meter (autorange) — the smallest range that holds the reading.
 */
export function accuracyFor(
  ranges: readonly MeterRange[],
  quantity: Quantity,
  meterFunction: MeterFunction | undefined,
  range: number | undefined,
  value: number | null,
): MeterAccuracy | undefined {
  const fn = meterFunction ?? QUANTITY_INFO[quantity].meterFunctions[0];
  const rows = ranges.filter((r) => r.function === fn).sort((a, b) => a.rangeMax - b.rangeMax);
  if (!rows.length) return undefined;
  const wanted = range ?? (value === null ? undefined : Math.abs(value));
  const row = wanted === undefined ? rows[rows.length - 1] : (rows.find((r) => r.rangeMax >= wanted) ?? rows[rows.length - 1]);
  return { pctOfReading: row.pctOfReading, counts: row.counts, resolution: row.resolution };
}
