import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseReading, type ParsedReading, type ParseResult } from '@shared/engine/parse-reading';
import { QUANTITIES, type Quantity } from '@shared/engine/quantity';

function ok(result: ParseResult): ParsedReading {
  if (!result.ok) throw new Error(`expected a reading, got: ${result.message}`);
  return result;
}

function value(text: string, quantity: Quantity): number | null {
  return ok(parseReading(text, quantity)).value;
}

function message(text: string, quantity: Quantity): string {
  const result = parseReading(text, quantity);
  if (result.ok) throw new Error(`expected a refusal for “${text}”, got ${result.value}`);
  return result.message;
}

describe('parseReading: numbers', () => {
  it('takes a bare number in the check’s unit', () => {
    const r = ok(parseReading('480', 'resistance'));
    expect(r).toMatchObject({ value: 480, overRange: false, quantity: 'resistance', normalized: '480 Ω' });
    expect(r.unitTyped).toBeUndefined();
  });

  it('reads a decimal comma as a decimal point', () => {
    expect(value('0,48', 'voltage_dc')).toBe(0.48);
    expect(ok(parseReading('0,48 kΩ', 'resistance')).normalized).toBe('0.48 kΩ');
    expect(value('12,45', 'voltage_dc')).toBe(12.45);
    expect(value('0,480', 'resistance')).toBe(0.48);
  });

  it('refuses "1,500": decimal comma or thousands separator can’t be told apart', () => {
    expect(message('1,500', 'resistance')).toMatch(/1\.500 or 1500/);
  });

  it('accepts leading and trailing decimal points and a plus sign', () => {
    expect(value('.5', 'voltage_dc')).toBe(0.5);
    expect(value('12.', 'voltage_dc')).toBe(12);
    expect(value('+3.3', 'voltage_dc')).toBe(3.3);
    expect(ok(parseReading('.5', 'voltage_dc')).normalized).toBe('0.5 V');
  });

  it('accepts exponent notation', () => {
    expect(value('1.5e3', 'resistance')).toBe(1500);
    expect(value('2E-3', 'voltage_dc')).toBe(0.002);
  });

  it('trims surrounding white space, tabs and no-break spaces', () => {
    expect(value('  12.6 V\t', 'voltage_dc')).toBe(12.6);
    expect(value('12.6\u00a0V', 'voltage_dc')).toBe(12.6);
  });

  it('allows negative voltage and current readings', () => {
    expect(value('-0.35', 'voltage_dc')).toBe(-0.35);
    expect(value('−12 mA', 'current_dc')).toBe(-0.012); // U+2212 minus sign
    expect(value('-4', 'temperature')).toBe(-4);
  });

  it('refuses negative resistance, continuity, diode and frequency readings', () => {
    for (const q of ['resistance', 'continuity', 'diode', 'frequency'] as const) {
      expect(message('-5', q)).toMatch(/can't be negative/);
    }
  });

  it('folds negative zero to zero', () => {
    expect(Object.is(value('-0', 'voltage_dc'), 0)).toBe(true);
  });

  it('rounds once: prefixes scale by exact powers of ten', () => {
    expect(value('0.29 kΩ', 'resistance')).toBe(290);
    expect(value('480 mV', 'voltage_dc')).toBe(0.48);
    expect(value('0.1 mA', 'current_dc')).toBe(0.0001);
  });
});

describe('parseReading: units and prefixes', () => {
  it.each([
    ['480 Ω', 480],
    ['480Ω', 480],
    ['480 ohm', 480],
    ['480 ohms', 480],
    ['480 Ohms', 480],
    ['0.48 kΩ', 480],
    ['0.48 kohm', 480],
    ['0.48 KΩ', 480],
    ['0.48 kilohms', 480],
    ['0.48 kiloohm', 480],
    ['2.2 MΩ', 2.2e6],
    ['2.2 Mohm', 2.2e6],
    ['2.2 megohm', 2.2e6],
    ['2.2 megaohms', 2.2e6],
    ['2.2 meg', 2.2e6],
    ['3 GΩ', 3e9],
    ['250 mΩ', 0.25],
    ['250 milliohms', 0.25],
    ['4.7k', 4700],
    ['4.7 K', 4700],
  ])('resistance %s → %d Ω', (text, expected) => {
    expect(value(text, 'resistance')).toBeCloseTo(expected, 9);
  });

  it('keeps m and M apart: milliohms versus megohms differ by 1e9', () => {
    expect(value('5 mΩ', 'resistance')).toBe(0.005);
    expect(value('5 MΩ', 'resistance')).toBe(5e6);
    expect(value('5 mohm', 'resistance')).toBe(0.005);
    expect(value('5 Mohm', 'resistance')).toBe(5e6);
  });

  it.each([
    ['12.6 V', 12.6],
    ['12.6 v', 12.6],
    ['12.6 volts', 12.6],
    ['12.6 Volt', 12.6],
    ['480 mV', 0.48],
    ['480 millivolts', 0.48],
    ['35 µV', 35e-6],
    ['35 uV', 35e-6],
    ['12.6 VDC', 12.6],
    ['12.6 V DC', 12.6],
    ['12.6 Vdc', 12.6],
    ['12.6 DCV', 12.6],
  ])('DC voltage %s → %d V', (text, expected) => {
    expect(value(text, 'voltage_dc')).toBeCloseTo(expected, 12);
  });

  it.each(['4.2 VAC', '4.2 V AC', '4.2 V~', '4.2 Vac', '4.2 V rms', '4.2 VAC RMS', '4.2 ACV', '4200 mV AC'])(
    'AC voltage %s → 4.2 V, marked AC',
    (text) => {
      const r = ok(parseReading(text, 'voltage_ac'));
      expect(r.value).toBeCloseTo(4.2, 12);
      expect(r.acdc).toBe('ac');
    },
  );

  it.each([
    ['1.2 A', 1.2],
    ['1.2 amps', 1.2],
    ['1.2 ampere', 1.2],
    ['25 mA', 0.025],
    ['25 milliamps', 0.025],
    ['50 µA', 50e-6],
    ['50 μA', 50e-6],
    ['50 uA', 50e-6],
    ['50 microamps', 50e-6],
    ['300 nA', 300e-9],
    ['25 mA DC', 0.025],
  ])('DC current %s → %d A', (text, expected) => {
    expect(value(text, 'current_dc')).toBeCloseTo(expected, 15);
  });

  it.each([
    ['60 Hz', 60],
    ['60 hz', 60],
    ['60 hertz', 60],
    ['1.2 kHz', 1200],
    ['1.2 KHZ', 1200],
    ['2 MHz', 2e6],
  ])('frequency %s → %d Hz', (text, expected) => {
    expect(value(text, 'frequency')).toBeCloseTo(expected, 9);
  });

  it('reads diode-test voltages in V and mV', () => {
    expect(value('0.552', 'diode')).toBe(0.552);
    expect(value('552 mV', 'diode')).toBe(0.552);
    expect(value('0.552 V', 'diode')).toBe(0.552);
  });

  it('reads temperatures in °C and converts °F', () => {
    expect(value('32 °C', 'temperature')).toBe(32);
    expect(value('32 C', 'temperature')).toBe(32);
    expect(value('32 degC', 'temperature')).toBe(32);
    expect(value('32 ℃', 'temperature')).toBe(32); // U+2103 folds to °C under NFKC
    expect(value('98.6 °F', 'temperature')).toBeCloseTo(37, 12);
    expect(ok(parseReading('98.6 F', 'temperature')).unitTyped).toBe('°F');
  });

  it('reports the unit as understood and a canonical form', () => {
    const r = ok(parseReading('0,48 kohms', 'resistance'));
    expect(r.unitTyped).toBe('kΩ');
    expect(r.normalized).toBe('0.48 kΩ');
    expect(ok(parseReading('4.7k', 'resistance')).unitTyped).toBe('kΩ');
    expect(ok(parseReading('50 uA', 'current_dc')).normalized).toBe('50 µA');
  });
});

describe('parseReading: Unicode (NFKC)', () => {
  it('takes both micro signs, U+00B5 and U+03BC', () => {
    expect(value('50 \u00b5A', 'current_dc')).toBe(value('50 \u03bcA', 'current_dc'));
    expect(value('50 \u00b5A', 'current_dc')).toBeCloseTo(50e-6, 15);
  });

  it('takes both ohm signs, U+2126 and U+03A9', () => {
    expect(value('4.7 k\u2126', 'resistance')).toBe(4700);
    expect(value('4.7 k\u03a9', 'resistance')).toBe(4700);
  });

  it('takes full-width digits and letters', () => {
    expect(value('１２.６ Ｖ', 'voltage_dc')).toBe(12.6);
  });
});

describe('parseReading: over range', () => {
  it.each(['OL', 'ol', 'O.L', 'O.L.', 'o.l.', 'open', 'OPEN', '∞', 'inf', 'Infinity', 'overload', ' OL '])(
    '%s on a resistance check is over range with no value',
    (text) => {
      const r = ok(parseReading(text, 'resistance'));
      expect(r.overRange).toBe(true);
      expect(r.value).toBeNull();
      expect(r.normalized).toBe('OL');
    },
  );

  it('accepts over range with the display’s unit', () => {
    const r = ok(parseReading('O.L MΩ', 'resistance'));
    expect(r).toMatchObject({ overRange: true, value: null, unitTyped: 'MΩ' });
  });

  it('accepts OL on a voltage check but not "open"', () => {
    expect(ok(parseReading('OL', 'voltage_dc')).overRange).toBe(true);
    expect(message('open', 'voltage_dc')).toMatch(/OL if the meter shows over range/);
  });

  it('refuses negative over range, asking for the leads swapped or a higher range', () => {
    expect(message('-OL', 'voltage_dc')).toMatch(/swap the leads/);
  });

  it('refuses a voltage unit after OL on a resistance check', () => {
    expect(message('OL V', 'resistance')).toMatch(/voltage unit/);
  });
});

describe('parseReading: refusals say what to type', () => {
  it('refuses empty and blank text', () => {
    expect(message('', 'resistance')).toMatch(/Type the reading/);
    expect(message('   ', 'resistance')).toMatch(/e\.g\. 480 Ω/);
  });

  it('refuses a unit of another quantity instead of guessing', () => {
    expect(message('12 V', 'resistance')).toMatch(/V is a voltage unit, but this check reads resistance/);
    expect(message('480 Ω', 'voltage_dc')).toMatch(/resistance unit/);
    expect(message('5 A', 'voltage_dc')).toMatch(/current unit/);
    expect(message('60 Hz', 'voltage_ac')).toMatch(/frequency unit/);
  });

  it('refuses AC typed on a DC check and the reverse', () => {
    expect(message('12 VAC', 'voltage_dc')).toMatch(/reads DC volts, but you typed AC/);
    expect(message('4 VDC', 'voltage_ac')).toMatch(/reads AC volts, but you typed DC/);
    expect(message('480 Ω AC', 'resistance')).toMatch(/AC\/DC doesn't apply/);
    expect(message('12 V AC DC', 'voltage_dc')).toMatch(/either AC or DC/);
  });

  it('refuses prefixes no shop meter shows on that quantity, hinting at the case slip', () => {
    expect(message('85 MA', 'current_dc')).toMatch(/megaamperes.*small m \(mA\)/);
    expect(message('12 MV', 'voltage_dc')).toMatch(/small m/);
    expect(message('3 kA', 'current_dc')).toMatch(/kiloamperes/);
    expect(message('20 mC', 'temperature')).toMatch(/without a prefix/);
  });

  it('refuses nonsense', () => {
    for (const text of ['abc', 'NaN', '--5', '.', 'V', 'kΩ', '12 bananas', '5e', '0x1F', '1/2']) {
      expect(parseReading(text, 'voltage_dc').ok, text).toBe(false);
    }
  });

  it('refuses two numbers', () => {
    expect(message('12 13', 'voltage_dc')).toMatch(/one reading at a time/);
    expect(message('12.6 V 12.4 V', 'voltage_dc')).toMatch(/one reading at a time/);
    expect(message('1.2.3', 'voltage_dc')).toMatch(/one decimal point/);
    expect(message('1,234.5', 'voltage_dc')).toMatch(/one decimal point/);
  });

  it('refuses absurd lengths and magnitudes', () => {
    expect(message('1'.repeat(41), 'resistance')).toMatch(/too long/);
    expect(message('5e400', 'resistance')).toMatch(/far beyond/);
    expect(message('9'.repeat(30), 'resistance')).toMatch(/far beyond/);
  });

  it('refuses non-string input from untyped callers without throwing', () => {
    expect(parseReading(12 as unknown as string, 'voltage_dc').ok).toBe(false);
    expect(parseReading(null as unknown as string, 'voltage_dc').ok).toBe(false);
  });
});

describe('parseReading: properties', () => {
  const quantity = fc.constantFrom(...QUANTITIES);

  it('never throws on arbitrary strings, and answers a finite value, over range, or a message', () => {
    const texts = fc.oneof(
      fc.string(),
      fc.string({ unit: 'grapheme' }),
      fc.string({ unit: 'binary' }), // any code point, lone surrogates included
      fc.string({ unit: fc.constantFrom(...'0123456789.,-+eE kKmMµuμnGΩΩohmVAHzcdO L~∞'.split('')) }),
    );
    fc.assert(
      fc.property(texts, quantity, (text, q) => {
        const r = parseReading(text, q);
        if (r.ok) return r.overRange ? r.value === null : Number.isFinite(r.value);
        return typeof r.message === 'string' && r.message.length > 0;
      }),
      { numRuns: 5000 },
    );
  });

  it('gives the same answer for a text and its NFKC form (the skip of normalisation for common symbols is safe)', () => {
    const symbols = fc.string({ unit: fc.constantFrom(...'0123456789., kmMµμuΩΩωVA°C−∞⎓\u0301\u00a0'.split('')), maxLength: 12 });
    fc.assert(
      fc.property(fc.oneof(symbols, fc.string({ unit: 'grapheme', maxLength: 12 })), fc.constantFrom(...QUANTITIES), (text, q) => {
        expect(parseReading(text, q)).toEqual(parseReading(text.normalize('NFKC'), q));
      }),
      { numRuns: 3000 },
    );
  });

  it('remembers unit parses without mixing up quantities', () => {
    expect(parseReading('12 V', 'voltage_dc').ok).toBe(true);
    expect(parseReading('12 V', 'resistance').ok).toBe(false);
    expect(parseReading('12 V', 'voltage_dc').ok).toBe(true);
  });

  it('reads any plain decimal number typed with a point or a comma the same as Number()', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 999_999 }), fc.integer({ min: 0, max: 6 }), (digits, decimals) => {
        const text = (digits / 10 ** decimals).toFixed(decimals);
        const expected = Number(text);
        const point = value(text, 'voltage_dc');
        const comma = parseReading(text.replace('.', ','), 'voltage_dc');
        const commaOk = !comma.ok ? /thousands separators/.test(comma.message) : comma.value === expected;
        return point === expected && commaOk;
      }),
    );
  });
});
