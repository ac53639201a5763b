import { describe, expect, it } from 'vitest';
import { checkUncertainty, bandAround, niceStep, specBarGeometry, windowOnly } from '@shared/diagnosis/spec-bar-geometry';
import { copperFactor } from '@shared/engine/copper';
import { evaluate } from '@shared/engine/evaluate';
import type { MeasureCheck } from '@shared/engine/procedure';
import type { MeterRange } from '@shared/workshop/schemas';

// Invented demo values (a pulse-coil window, a diode pair, a bench meter's accuracy table), not any manufacturer's.
const BENCH_OHMS: MeterRange[] = [
  { function: 'ohms', rangeMax: 600, resolution: 0.1, pctOfReading: 0.8, counts: 3 },
  { function: 'ohms', rangeMax: 6000, resolution: 1, pctOfReading: 0.8, counts: 3 },
  { function: 'dc_volts', rangeMax: 60, resolution: 0.01, pctOfReading: 0.5, counts: 2 },
  { function: 'diode', rangeMax: 3, resolution: 0.001, pctOfReading: 1, counts: 3 },
];
const COIL: Pick<MeasureCheck, 'spec' | 'quantity' | 'meterFunction' | 'range'> = {
  spec: { kind: 'window', min: 360, max: 440, unit: 'Ω', copperAt20C: true },
  quantity: 'resistance',
  meterFunction: 'ohms',
  range: 600,
};
const accuracy600 = { pctOfReading: 0.8, counts: 3, resolution: 0.1 };
const ohms = (value: number | null) => ({ value, overRange: value === null, quantity: 'resistance' as const });

describe('the scale', () => {
  it('shows a window in the middle of round ends, with evenly spaced ticks', () => {
    const g = specBarGeometry(COIL.spec, 'resistance', windowOnly(COIL.spec, 'resistance', { ambientC: 20 }))!;
    expect(g.scaleMin).toBe(300);
    expect(g.scaleMax).toBe(500);
    expect(g.ticks.map((t) => t.value)).toEqual([300, 350, 400, 450, 500]);
    expect(g.window).toEqual({ from: 0.3, to: 0.7 });
    expect(g.marker).toBeNull();
  });

  it('draws the temperature-corrected limits that evaluate uses', () => {
    const e = windowOnly(COIL.spec, 'resistance', { ambientC: 32 });
    expect(e.limits.min).toBeCloseTo(360 * copperFactor(32), 9);
    const g = specBarGeometry(COIL.spec, 'resistance', e)!;
    expect(g.limits.map((l) => l.value)).toEqual([e.limits.min, e.limits.max]);
    expect(e.correctedToC).toBe(32);
  });

  it('never runs below zero for a quantity without a sign', () => {
    const spec = { kind: 'expect_continuity', max: 1 } as const;
    const g = specBarGeometry(spec, 'continuity', windowOnly(spec, 'continuity', {}), () => 0.6)!;
    expect(g.scaleMin).toBe(0);
    expect(g.window).toEqual({ from: 0, to: g.limits[0].at });
  });

  it('stretches to hold a reading near the window and pins one far away to the end', () => {
    const spec = { kind: 'at_most', max: 0.5 } as const;
    const near = specBarGeometry(spec, 'voltage_dc', evaluate(spec, { value: 1.8, overRange: false, quantity: 'voltage_dc' }))!;
    expect(near.scaleMax).toBeGreaterThanOrEqual(1.8);
    expect(near.marker).toMatchObject({ kind: 'value', beyond: null });

    const far = specBarGeometry(spec, 'voltage_dc', evaluate(spec, { value: 11.8, overRange: false, quantity: 'voltage_dc' }))!;
    expect(far.scaleMax).toBe(1);
    expect(far.marker).toMatchObject({ kind: 'value', value: 11.8, at: 1, beyond: 'high' });
  });

  it('puts an at-least limit in the middle so both sides show', () => {
    const spec = { kind: 'at_least', min: 12.4 } as const;
    const g = specBarGeometry(spec, 'voltage_dc', windowOnly(spec, 'voltage_dc', {}))!;
    expect(g.limits[0].at).toBeGreaterThan(0.3);
    expect(g.limits[0].at).toBeLessThan(0.7);
    expect(g.window!.to).toBe(1);
    expect(g.overRangePasses).toBe(true);
  });

  it('has nothing to draw for a record-only spec', () => {
    const spec = { kind: 'record_only' } as const;
    expect(specBarGeometry(spec, 'voltage_dc', evaluate(spec, { value: 3, overRange: false, quantity: 'voltage_dc' }))).toBeNull();
  });
});

describe('the marginal bands', () => {
  const uAt = checkUncertainty(COIL, BENCH_OHMS);

  it('come from the meter accuracy on the check’s range', () => {
    expect(uAt(440)).toBeCloseTo(440 * 0.008 + 0.3, 12);
  });

  it('end exactly where evaluate stops calling a reading marginal', () => {
    const { low, high } = bandAround(440, uAt);
    const verdict = (x: number) => evaluate(COIL.spec, ohms(x), { accuracy: accuracy600, ambientC: 20 }).verdict;
    expect(verdict(low - 0.01)).toBe('in_spec');
    expect(verdict(low + 0.01)).toBe('marginal');
    expect(verdict(high - 0.01)).toBe('marginal');
    expect(verdict(high + 0.01)).toBe('high');
  });

  it('sit either side of each limit on the bar', () => {
    const g = specBarGeometry(COIL.spec, 'resistance', windowOnly(COIL.spec, 'resistance', { ambientC: 20 }), uAt)!;
    expect(g.bands).toHaveLength(2);
    for (const band of g.bands) {
      const limit = g.limits.find((l) => l.side === band.side)!;
      expect(band.from).toBeLessThan(limit.at);
      expect(band.to).toBeGreaterThan(limit.at);
    }
  });

  it('fall back to the evaluation’s own uncertainty when no accuracy table is given', () => {
    const e = evaluate(COIL.spec, ohms(437), { accuracy: accuracy600, ambientC: 20 });
    const g = specBarGeometry(COIL.spec, 'resistance', e)!;
    expect(g.bands).toHaveLength(2);
    expect(e.verdict).toBe('marginal');
    expect(g.marker).toMatchObject({ kind: 'value', value: 437 });
  });
});

describe('the reading marker', () => {
  it('marks a reading typed in another prefix at its SI value, with its uncertainty interval', () => {
    const e = evaluate(COIL.spec, ohms(450), { accuracy: accuracy600, ambientC: 20 });
    const g = specBarGeometry(COIL.spec, 'resistance', e)!;
    const marker = g.marker as Extract<typeof g.marker, { kind: 'value' }>;
    expect(marker.at).toBeCloseTo((450 - g.scaleMin) / (g.scaleMax - g.scaleMin), 12);
    expect(marker.interval!.from).toBeLessThan(marker.at);
    expect(marker.interval!.to).toBeGreaterThan(marker.at);
  });

  it('goes past the end for over range, which fails a window and passes an open-circuit spec', () => {
    const window = specBarGeometry(COIL.spec, 'resistance', evaluate(COIL.spec, ohms(null), { ambientC: 20 }))!;
    expect(window.marker).toEqual({ kind: 'over_range' });
    expect(window.overRangePasses).toBe(false);

    const open = { kind: 'expect_open', openAbove: 1e6 } as const;
    const g = specBarGeometry(open, 'resistance', evaluate(open, ohms(null)))!;
    expect(g.marker).toEqual({ kind: 'over_range' });
    expect(g.overRangePasses).toBe(true);
  });

  it('places a diode’s reverse/forward ratio against the minimum ratio, OL in reverse past the end', () => {
    const ratio = { kind: 'ratio', pairWith: 'forward', minRatio: 4 } as const;
    const readings = { forward: { value: 0.6, overRange: false, uncertainty: 0.009 } };
    const diode = { spec: ratio, quantity: 'diode' as const, meterFunction: 'diode' as const };
    const e = evaluate(ratio, { value: 1.2, overRange: false, quantity: 'diode' }, { readings, accuracy: { pctOfReading: 1, counts: 3, resolution: 0.001 } });
    const g = specBarGeometry(ratio, 'diode', e, checkUncertainty(diode, BENCH_OHMS, readings))!;
    expect(g.limits).toEqual([expect.objectContaining({ side: 'min', value: 4 })]);
    expect(g.marker).toMatchObject({ kind: 'value', value: 2 });
    expect(g.scaleMin).toBe(0);

    const open = specBarGeometry(ratio, 'diode', evaluate(ratio, { value: null, overRange: true, quantity: 'diode' }, { readings }))!;
    expect(open.marker).toEqual({ kind: 'over_range' });
  });
});

describe('niceStep', () => {
  it.each([
    [0.7, 1],
    [44, 50],
    [0.13, 0.2],
    [3, 5],
    [1000, 1000],
  ])('%s → %s', (raw, step) => {
    expect(niceStep(raw)).toBeCloseTo(step, 12);
  });
});
