import Qty from 'js-quantities';
import { describe, expect, it } from 'vitest';
import { parseReading } from '@shared/engine/parse-reading';
import { QUANTITIES, QUANTITY_INFO, type Dimension, type Quantity } from '@shared/engine/quantity';
import { FUSED_UNIT_WORDS, PREFIX_SYMBOLS, PREFIX_WORDS, SI_PREFIXES, UNIT_SPELLINGS } from '@shared/engine/units';

function si(text: string, quantity: Quantity): number {
  const r = parseReading(text, quantity);
  if (!r.ok || r.value === null) throw new Error(`“${text}” on ${quantity}: ${r.ok ? 'over range' : r.message}`);
  return r.value;
}

function expectRelative(actual: number, expected: number, tolerance: number) {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(Math.abs(expected) * tolerance);
}

describe('SI prefixes — BIPM, The International System of Units, 9th ed. (2019), Table 7', () => {
  const table7 = { G: 1e9, M: 1e6, k: 1e3, m: 1e-3, µ: 1e-6, n: 1e-9 };

  it('our prefix table carries the Table 7 symbol and factor for each prefix we use', () => {
    expect(Object.fromEntries(SI_PREFIXES.map((p) => [p.symbol, 10 ** p.exponent]))).toEqual(table7);
    expect(SI_PREFIXES.map((p) => p.name)).toEqual(['giga', 'mega', 'kilo', 'milli', 'micro', 'nano']);
  });

  it('each prefix joins its unit into one symbol and scales the reading by its factor', () => {
    expect(si('1 GΩ', 'resistance')).toBe(1e9);
    expect(si('1 MΩ', 'resistance')).toBe(1e6);
    expect(si('1 kΩ', 'resistance')).toBe(1e3);
    expect(si('1 mΩ', 'resistance')).toBe(1e-3);
    expect(si('1 µA', 'current_dc')).toBe(1e-6);
    expect(si('1 nA', 'current_dc')).toBe(1e-9);
  });

  it('case matters: mΩ and MΩ differ by a factor of 1e9', () => {
    expect(si('1 MΩ', 'resistance') / si('1 mΩ', 'resistance')).toBeCloseTo(1e9, 0);
  });
});

describe('Unicode micro and ohm signs (checked by computation)', () => {
  it('NFKC folds both micro signs and both ohm signs; NFC folds only the ohm pair', () => {
    expect('\u00b5'.normalize('NFKC')).toBe('\u03bc');
    expect('\u2126'.normalize('NFKC')).toBe('\u03a9');
    expect('\u2126'.normalize('NFC')).toBe('\u03a9');
    expect('\u00b5'.normalize('NFC')).toBe('\u00b5');
  });

  it('so the parser reads both spellings of each alike', () => {
    expect(si('47 \u00b5A', 'current_dc')).toBe(si('47 \u03bcA', 'current_dc'));
    expect(si('4.7 k\u2126', 'resistance')).toBe(si('4.7 k\u03a9', 'resistance'));
  });
});

/**
 * Cross-check against js-quantities (an independent units library from the registry) for every unit spelling
 * and prefix the parser accepts. js-quantities reads "MΩ" as molar·ohm and "GΩ" as G·ohm, so it is given
 * its own canonical spelling (prefix symbol + ohm/V/A/Hz), and its kind is checked so a misread can't pass.
 */
describe('parser against js-quantities, every unit and prefix it knows', () => {
  const JS_UNIT: Record<Exclude<Dimension, 'temperature'>, { unit: string; kind: string }> = {
    resistance: { unit: 'ohm', kind: 'resistance' },
    voltage: { unit: 'V', kind: 'potential' },
    current: { unit: 'A', kind: 'current' },
    frequency: { unit: 'Hz', kind: 'frequency' },
  };
  const JS_PREFIX: Record<number, string> = { 9: 'G', 6: 'M', 3: 'k', 0: '', [-3]: 'm', [-6]: 'u', [-9]: 'n' };
  const SYMBOL_CASE: Record<string, string> = { ω: 'Ω', v: 'V', a: 'A', hz: 'Hz' };

  /** Every way the parser accepts a unit for this quantity, with the power of ten it means. */
  function spellings(quantity: Quantity): [typed: string, exponent: number][] {
    const info = QUANTITY_INFO[quantity];
    const units = UNIT_SPELLINGS[info.dimension].map((u) => SYMBOL_CASE[u] ?? u);
    const out: [string, number][] = [];
    for (const exponent of info.prefixExponents) {
      const symbols = [...PREFIX_SYMBOLS].filter(([, e]) => e === exponent).map(([s]) => s);
      const words = PREFIX_WORDS.filter(([, e]) => e === exponent).map(([w]) => w);
      for (const unit of units) {
        if (exponent === 0) out.push([unit, 0]);
        for (const s of symbols) out.push([s + unit, exponent]);
        if (unit.length > 2) for (const w of words) out.push([w + unit, exponent]);
      }
      for (const s of symbols) out.push([s, exponent]); // bare prefix: "4.7k"
      for (const [word, [dimension, e]] of FUSED_UNIT_WORDS) if (dimension === info.dimension && e === exponent) out.push([word, e]);
    }
    return out;
  }

  for (const quantity of QUANTITIES.filter((q) => q !== 'temperature')) {
    const dimension = QUANTITY_INFO[quantity].dimension as Exclude<Dimension, 'temperature'>;
    it(`${quantity}: ${spellings(quantity).length} spellings agree within 1e-12 relative`, () => {
      const js = JS_UNIT[dimension];
      for (const [typed, exponent] of spellings(quantity)) {
        const reference = Qty(`1.5 ${JS_PREFIX[exponent]}${js.unit}`);
        expect(reference.kind(), typed).toBe(js.kind);
        expectRelative(si(`1.5 ${typed}`, quantity), reference.toBase().scalar, 1e-12);
      }
    });
  }

  it('spellings js-quantities itself understands give the same value read directly', () => {
    for (const [typed, q] of [['480 Ω', 'resistance'], ['0.48 kΩ', 'resistance'], ['2.2 Mohm', 'resistance'], ['50 µA', 'current_dc'], ['50 uA', 'current_dc'], ['12.6 V', 'voltage_dc'], ['480 mV', 'voltage_dc'], ['1.2 kHz', 'frequency'], ['2 milliamp', 'current_dc'], ['3 volts', 'voltage_dc']] as const) {
      expectRelative(si(typed, q), Qty(typed).toBase().scalar, 1e-12);
    }
  });

  it('temperatures: °C as is, °F converted as js-quantities converts tempF to tempC', () => {
    expect(si('32 °C', 'temperature')).toBe(Qty('32 tempC').to('tempC').scalar);
    for (const f of [-40, 32, 98.6, 212]) expectRelative(si(`${f} °F`, 'temperature') + 1000, Qty(`${f} tempF`).to('tempC').scalar + 1000, 1e-12);
  });
});
