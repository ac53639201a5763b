import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseReading } from '@shared/engine/parse-reading';
import { QUANTITIES, QUANTITY_INFO } from '@shared/engine/quantity';
import { formatValue, scaleByPowerOfTen } from '@shared/engine/units';

describe('formatValue', () => {
  it.each([
    [480, 'resistance', '480 Ω'],
    [0.085, 'current_dc', '85 mA'],
    [1500, 'resistance', '1.50 kΩ'],
    [0.48, 'resistance', '480 mΩ'],
    [12.6, 'voltage_dc', '12.6 V'],
    [-0.35, 'voltage_dc', '-350 mV'],
    [2.2e6, 'resistance', '2.20 MΩ'],
    [50e-6, 'current_dc', '50 µA'],
    [1200, 'frequency', '1.20 kHz'],
    [0, 'voltage_dc', '0 V'],
    [32, 'temperature', '32 °C'],
    [0.552, 'diode', '552 mV'],
  ] as const)('%d %s → %s', (si, quantity, expected) => {
    expect(formatValue(si, quantity)).toBe(expected);
  });

  it('moves up a prefix when rounding carries to 1000', () => {
    expect(formatValue(999.7, 'resistance')).toBe('1 kΩ');
    expect(formatValue(999.4, 'resistance')).toBe('999 Ω');
  });

  it('only uses prefixes the quantity’s readings accept, writing whole units past the largest', () => {
    expect(formatValue(1500, 'current_dc')).toBe('1500 A'); // no kA on a shop meter
    expect(formatValue(1e-7, 'resistance')).toBe('0.000100 mΩ'); // no µΩ either
    expect(formatValue(2500, 'temperature')).toBe('2500 °C');
  });

  it('honours the number of significant digits asked for', () => {
    expect(formatValue(0.48051, 'resistance', { significant: 4 })).toBe('480.5 mΩ');
    expect(formatValue(12.63, 'voltage_dc', { significant: 2 })).toBe('13 V');
  });

  it('shows a dash for a value that is not finite', () => {
    expect(formatValue(Number.NaN, 'voltage_dc')).toBe('— V');
  });
});

describe('scaleByPowerOfTen', () => {
  it('scales with a single rounding within the exact powers', () => {
    expect(scaleByPowerOfTen(29, -2)).toBe(0.29);
    expect(scaleByPowerOfTen(29, 1)).toBe(290);
    expect(scaleByPowerOfTen(1, 30)).toBe(1e30);
    expect(scaleByPowerOfTen(1, -30)).toBeCloseTo(1e-30, 40);
  });
});

describe('formatValue then parseReading', () => {
  it('returns the same value within the rounding of the digits shown', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...QUANTITIES),
        fc.double({ min: 1e-9, max: 1e11, noNaN: true }),
        fc.boolean(),
        fc.integer({ min: 3, max: 6 }),
        (quantity, magnitude, negative, significant) => {
          const si = negative && QUANTITY_INFO[quantity].signed ? -magnitude : magnitude;
          const text = formatValue(si, quantity, { significant });
          const parsed = parseReading(text, quantity);
          if (!parsed.ok || parsed.value === null) return false;
          // Half a unit in the last shown digit, relative: 0.5·10^(1−significant).
          return Math.abs(parsed.value - si) <= Math.abs(si) * 0.5 * 10 ** (1 - significant) * (1 + 1e-9);
        },
      ),
      { numRuns: 3000 },
    );
  });
});
