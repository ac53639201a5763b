import { describe, expect, it } from 'vitest';
import { readingUncertainty, resolutionFor } from '@shared/engine/accuracy';
import { BCI_OCV_TABLE, stateOfCharge } from '@shared/engine/battery';
import { evaluate } from '@shared/engine/evaluate';
import { parseReading } from '@shared/engine/parse-reading';
import { checkVin, vinCheckDigit } from '@shared/engine/vin';

describe('12 V lead-acid state of charge — Battery Council International table (flooded, 26.7 °C, rested)', () => {
  it.each([
    [12.65, 100],
    [12.45, 75],
    [12.24, 50],
    [12.06, 25],
    [11.89, 0],
  ])('%d V is %i %%', (volts, percent) => {
    expect(stateOfCharge(volts)).toBeCloseTo(percent, 10);
  });

  it('carries exactly the five published points', () => {
    expect(BCI_OCV_TABLE).toEqual([
      [11.89, 0],
      [12.06, 25],
      [12.24, 50],
      [12.45, 75],
      [12.65, 100],
    ]);
  });

  it('interpolates linearly between points (common practice, no source) and clamps outside', () => {
    expect(stateOfCharge(12.55)).toBeCloseTo(87.5, 10);
    expect(stateOfCharge(12.15)).toBeCloseTo(37.5, 10);
    expect(stateOfCharge(13.2)).toBe(100);
    expect(stateOfCharge(10.5)).toBe(0);
    expect(stateOfCharge(Number.NaN)).toBe(0);
  });
});

describe("meter accuracy — a meter maker's published application note (checked)", () => {
  it('6000-count meter, 600.0 V range: one count is 0.1 V; 120.0 V read at ±(1 % + 3) is ±1.5 V', () => {
    const resolution = resolutionFor(600, 6000);
    expect(resolution).toBeCloseTo(0.1, 12);
    expect(readingUncertainty(120, { pctOfReading: 1, counts: 3, resolution })).toBeCloseTo(1.5, 12);
  });

  it('guard band (JCGM 106:2012, ILAC-G8): that reading is marginal against a 121 V limit, clearly low against 122 V', () => {
    // Limits are invented; the decision rule is the standards'.
    const accuracy = { pctOfReading: 1, counts: 3, resolution: 0.1 };
    const reading = { value: 120, overRange: false, quantity: 'voltage_ac' as const };
    expect(evaluate({ kind: 'at_least', min: 121 }, reading, { accuracy })).toMatchObject({ verdict: 'marginal', leans: 'low' });
    expect(evaluate({ kind: 'at_least', min: 122 }, reading, { accuracy }).verdict).toBe('low');
    expect(evaluate({ kind: 'at_least', min: 118 }, reading, { accuracy }).verdict).toBe('in_spec');
  });
});

describe('diode test and OL — several meter manuals (checked)', () => {
  const ratio = { kind: 'ratio' as const, pairWith: 'fwd', minRatio: 10 };
  const read = (text: string) => {
    const r = parseReading(text, 'diode');
    if (!r.ok) throw new Error(r.message);
    return r;
  };
  const forward = (text: string) => ({ readings: { fwd: read(text) } });

  it('a good silicon junction: about 0.5–0.8 V one way, OL the other', () => {
    expect(evaluate(ratio, read('OL'), forward('0.62')).verdict).toBe('in_spec');
  });

  it('about 0 both ways is shorted; OL both ways is open', () => {
    expect(evaluate(ratio, read('0.002'), forward('0.001')).verdict).toBe('low');
    expect(evaluate(ratio, read('OL'), forward('OL')).verdict).toBe('open');
  });

  it('OL on a resistance range is an open circuit, stored as over range, never as a number', () => {
    const r = parseReading('OL', 'resistance');
    expect(r).toMatchObject({ ok: true, overRange: true, value: null });
    expect(evaluate({ kind: 'window', min: 400, max: 500 }, r.ok ? r : null).verdict).toBe('open');
  });
});

describe('VIN check digit — 49 CFR 565', () => {
  it('the widely reproduced worked example 1M8GDM9AXKP042788 has check digit X (from memory)', () => {
    // Sum of products 351; 351 mod 11 = 10 → X.
    expect(vinCheckDigit('1M8GDM9AXKP042788')).toBe('X');
    expect(checkVin('1M8GDM9AXKP042788')).toEqual({ ok: true, vin: '1M8GDM9AXKP042788', checkDigit: { expected: 'X', found: 'X' } });
  });

  it.each([
    // Invented VINs; products summed by hand with weights 8,7,6,5,4,3,2,10,0,9,8,7,6,5,4,3,2.
    ['11111111111111111', '1'], // sum of weights 89; 89 mod 11 = 1
    ['5ZP4B2C71RG000123', '1'], // 40+63+42+20+8+6+6+70+0+81+56+0+0+0+4+6+6 = 408; 408 mod 11 = 1
    ['3TV8M6E58SA104277', '8'], // 24+21+30+40+16+18+10+50+0+18+8+7+0+20+8+21+14 = 305; 305 mod 11 = 8
  ])('%s has check digit %s', (vin, digit) => {
    expect(vinCheckDigit(vin)).toBe(digit);
    const r = checkVin(vin);
    expect(r.ok).toBe(true);
    expect(r.ok && r.warning).toBeUndefined();
  });

  it('a wrong check digit is a warning, not an error (other markets need not use it)', () => {
    const r = checkVin('5ZP4B2C79RG000123');
    expect(r).toMatchObject({ ok: true, checkDigit: { expected: '1', found: '9' } });
    expect(r.ok && r.warning).toMatch(/should be 1/);
  });
});
