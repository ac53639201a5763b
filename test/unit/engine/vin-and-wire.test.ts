import { describe, expect, it } from 'vitest';
import { checkVin, vinCheckDigit } from '@shared/engine/vin';
import { gaugeAreaMm2, isValidGauge, wireResistance } from '@shared/engine/wire';

describe('checkVin: structure', () => {
  it('accepts lower case and surrounding spaces, returning the VIN in capitals', () => {
    expect(checkVin('  5zp4b2c71rg000123 ')).toMatchObject({ ok: true, vin: '5ZP4B2C71RG000123' });
  });

  it('refuses a VIN of the wrong length, saying how long it is', () => {
    expect(checkVin('5ZP4B2C71RG00012')).toEqual({ ok: false, message: expect.stringMatching(/17 characters; this one has 16/) });
  });

  it('refuses I, O and Q, suggesting the digit it probably is', () => {
    expect(checkVin('5ZP4B2C71RG00O123')).toEqual({ ok: false, message: expect.stringMatching(/never contains I, O or Q.*really 0/) });
    expect(checkVin('5ZP4B2C71RG00I123')).toEqual({ ok: false, message: expect.stringMatching(/really 1/) });
  });

  it('refuses characters that are not letters or digits', () => {
    expect(checkVin('5ZP4B2C71RG-00123')).toEqual({ ok: false, message: expect.stringMatching(/“-” can't be in a VIN/) });
  });

  it('computes no check digit for a malformed VIN', () => {
    expect(vinCheckDigit('SHORT')).toBeUndefined();
    expect(vinCheckDigit('5ZP4B2C71RG00O123')).toBeUndefined();
  });
});

describe('wire gauges', () => {
  it('takes a metric size at its nominal area', () => {
    expect(gaugeAreaMm2({ system: 'mm2', size: 0.75 })).toBe(0.75);
  });

  it('grows linearly with length and with the copper factor', () => {
    const one = wireResistance({ gauge: { system: 'awg', size: 16 }, lengthM: 1 });
    expect(wireResistance({ gauge: { system: 'awg', size: 16 }, lengthM: 3 })).toBeCloseTo(3 * one, 15);
    expect(wireResistance({ gauge: { system: 'awg', size: 16 }, lengthM: 1 }, 45)).toBeCloseTo(one * (1 + 0.00393 * 25), 15);
  });

  it('knows which sizes exist', () => {
    expect(isValidGauge({ system: 'awg', size: 18 })).toBe(true);
    expect(isValidGauge({ system: 'awg', size: -3 })).toBe(true);
    expect(isValidGauge({ system: 'awg', size: 18.5 })).toBe(false);
    expect(isValidGauge({ system: 'awg', size: 41 })).toBe(false);
    expect(isValidGauge({ system: 'mm2', size: 0.35 })).toBe(true);
    expect(isValidGauge({ system: 'mm2', size: 0 })).toBe(false);
  });
});
