import { describe, expect, it } from 'vitest';
import { COPPER_ALPHA_20, COPPER_RESISTIVITY_20, copperFactor, copperResistanceAt } from '@shared/engine/copper';
import { evaluate } from '@shared/engine/evaluate';
import { awgDiameterMm, wireResistance, type WireGauge } from '@shared/engine/wire';

const awg = (size: number): WireGauge => ({ system: 'awg', size });
const mm2 = (size: number): WireGauge => ({ system: 'mm2', size });
const FOOT = 0.3048;

function expectRelative(actual: number, expected: number, tolerance: number) {
  expect(Math.abs(actual - expected), `${actual} vs ${expected}`).toBeLessThanOrEqual(Math.abs(expected) * tolerance);
}

describe('annealed copper — International Annealed Copper Standard (IEC 60028)', () => {
  it('ρ20 = 1/58 Ω·mm²/m = 0.0172414 and α20 = 0.00393 /°C', () => {
    expect(COPPER_RESISTIVITY_20).toBeCloseTo(0.0172414, 7);
    expect(COPPER_ALPHA_20).toBe(0.00393);
  });

  it('worked example: R20 = 0.500 Ω reads 0.5393 Ω at 40 °C and 0.4607 Ω at 0 °C', () => {
    expect(copperResistanceAt(0.5, 40)).toBeCloseTo(0.5393, 10);
    expect(copperResistanceAt(0.5, 0)).toBeCloseTo(0.4607, 10);
    expect(copperResistanceAt(0.5, 20)).toBe(0.5);
  });

  it('a winding window quoted at 20 °C is corrected with the same factor', () => {
    const e = evaluate({ kind: 'nominal', nominal: 0.5, tolAbs: 0, copperAt20C: true }, { value: 0.5393, overRange: false, quantity: 'resistance' }, { ambientC: 40 });
    expect(e.limits.min).toBeCloseTo(0.5393, 10);
    expect(e.limits.max).toBeCloseTo(0.5393, 10);
  });
});

describe('AWG — ASTM B258', () => {
  it('diameter formula: 36 AWG is 0.127 mm and 4/0 (written -3) is 92 × 0.127 mm = 11.684 mm by definition', () => {
    expect(awgDiameterMm(36)).toBeCloseTo(0.127, 12);
    expect(awgDiameterMm(-3)).toBeCloseTo(11.684, 12);
  });

  // Solid copper at 20 °C, Ω/km, from a published ASTM B258 gauge table (checked).
  it.each([
    [10, 3.277],
    [12, 5.211],
    [14, 8.286],
    [16, 13.17],
    [18, 20.95],
    [20, 33.31],
    [22, 52.96],
  ])('%i AWG: %d Ω/km at 20 °C (within 0.05 %)', (gauge, ohmsPerKm) => {
    expectRelative(wireResistance({ gauge: awg(gauge), lengthM: 1000 }), ohmsPerKm, 5e-4);
  });
});

describe('NEC Chapter 9, Table 8 (solid uncoated copper, Ω per 1000 ft at 75 °C)', () => {
  it('the table’s 75 °C converts to 20 °C by dividing by 1 + 0.00393 · 55 = 1.21615', () => {
    expect(copperFactor(75)).toBeCloseTo(1.21615, 10);
  });

  // 18 AWG is checked (REFERENCES.md); 14, 12 and 10 AWG are from memory of the same table.
  it.each([
    [18, 7.77, 'checked'],
    [14, 3.07, 'from memory'],
    [12, 1.93, 'from memory'],
    [10, 1.21, 'from memory'],
  ])('%i AWG: %d Ω/kft at 75 °C (%s), within 0.5 %', (gauge, ohmsPerKft) => {
    expectRelative(wireResistance({ gauge: awg(gauge), lengthM: 1000 * FOOT }, 75), ohmsPerKft, 5e-3);
  });
});

describe('IEC 60228, class 5 flexible plain copper: maximum resistance at 20 °C', () => {
  // These are maxima (stranding and tolerances push real conductors up); our nominal-area value must not exceed them.
  it.each([
    [0.5, 39.0],
    [0.75, 26.0],
    [1.0, 19.5],
    [1.5, 13.3],
    [2.5, 7.98],
  ])('%d mm²: ours is at most %d Ω/km', (area, maxOhmsPerKm) => {
    const ours = wireResistance({ gauge: mm2(area), lengthM: 1000 });
    expect(ours).toBeLessThanOrEqual(maxOhmsPerKm);
    expect(ours).toBeGreaterThan(maxOhmsPerKm * 0.8); // and not absurdly below: same order as the standard
  });
});

describe("Ohm's law worked example (REFERENCES.md)", () => {
  it('5.0 A through 2.5 m out and 2.5 m back of 18 AWG: 0.1047 Ω loop, 0.524 V drop', () => {
    const loop = wireResistance({ gauge: awg(18), lengthM: 5 });
    expect(loop).toBeCloseTo(0.1047, 4);
    expect(5.0 * loop).toBeCloseTo(0.524, 3);
  });
});
