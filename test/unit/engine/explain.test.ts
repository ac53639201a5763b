import { describe, expect, it } from 'vitest';
import { evaluate, type ReadingValue } from '@shared/engine/evaluate';
import { explainEvaluation } from '@shared/engine/explain';
import type { Spec } from '@shared/engine/spec';

const ohms = (value: number | null): ReadingValue => ({ value, overRange: value === null, quantity: 'resistance' });

function say(spec: Spec, reading: ReadingValue | null, ctx = {}): string {
  return explainEvaluation(spec, evaluate(spec, reading, ctx), reading?.quantity ?? 'resistance');
}

describe('explainEvaluation', () => {
  it('says where a reading sits against a window, with the temperature correction', () => {
    const spec: Spec = { kind: 'window', min: 400, max: 500, copperAt20C: true };
    expect(say(spec, ohms(560), { ambientC: 32 })).toBe('560 Ω is above the 419–524 Ω window (corrected to 32 °C).');
    expect(say({ kind: 'window', min: 400, max: 500 }, ohms(480))).toBe('480 Ω is within the 400–500 Ω window.');
    expect(say({ kind: 'window', min: 0.8, max: 1.2 }, ohms(0.5))).toBe('500 mΩ is below the 800 mΩ–1.20 Ω window.');
  });

  it('mentions the meter uncertainty on a marginal reading', () => {
    const text = say({ kind: 'window', min: 400, max: 500 }, ohms(497), { accuracy: { pctOfReading: 1, counts: 2, resolution: 0.1 } });
    expect(text).toBe('497 Ω is too close to call against the 400–500 Ω window, ±5.17 Ω meter uncertainty.');
  });

  it('describes one-sided limits, open circuits and records', () => {
    expect(say({ kind: 'at_most', max: 0.2 }, { value: 0.35, overRange: false, quantity: 'voltage_dc' })).toBe('350 mV is above the maximum of 200 mV.');
    expect(say({ kind: 'at_least', min: 12.4 }, { value: 12.6, overRange: false, quantity: 'voltage_dc' })).toBe('12.6 V meets the minimum of 12.4 V.');
    expect(say({ kind: 'window', min: 400, max: 500 }, ohms(null))).toBe('OL: open circuit against the 400–500 Ω window.');
    expect(say({ kind: 'expect_open' }, ohms(null))).toBe('OL: open, as expected.');
    expect(say({ kind: 'expect_open' }, ohms(1200))).toBe('1.20 kΩ: a reading where an open circuit (OL) is expected.');
    expect(say({ kind: 'record_only' }, ohms(3.3))).toBe('Recorded: 3.30 Ω.');
    expect(say({ kind: 'window', min: 1, max: 2 }, null)).toBe('No reading to judge.');
  });

  it('describes both-ways ratios', () => {
    const spec: Spec = { kind: 'ratio', pairWith: 'fwd', minRatio: 10 };
    const diode = (value: number | null): ReadingValue => ({ value, overRange: value === null, quantity: 'diode' });
    const fwd = (value: number | null) => ({ readings: { fwd: { value, overRange: value === null } } });
    expect(explainEvaluation(spec, evaluate(spec, diode(2.8), fwd(0.56)), 'diode')).toBe('Reverse/forward ratio 5 is below the minimum of 10.');
    expect(explainEvaluation(spec, evaluate(spec, diode(null), fwd(0.56)), 'diode')).toMatch(/blocks one way/);
    expect(explainEvaluation(spec, evaluate(spec, diode(null), fwd(null)), 'diode')).toMatch(/open/);
    expect(explainEvaluation(spec, evaluate(spec, diode(0.5), fwd(null)), 'diode')).toMatch(/backwards/);
    expect(explainEvaluation(spec, evaluate(spec, diode(0.5), {}), 'diode')).toBe('No earlier reading from “fwd” to compare with.');
  });

  it('describes agreement with an earlier reading and the wire between', () => {
    const spec: Spec = { kind: 'agree_with', checkId: 'near', tolAbs: 5, wire: { gauge: { system: 'awg', size: 18 }, lengthM: 5 } };
    const text = say(spec, ohms(470), { readings: { near: { value: 450, overRange: false } } });
    expect(text).toBe('470 Ω is above the earlier 450 Ω plus 105 mΩ of wire: 445–455 Ω.');
    expect(say(spec, ohms(451), { readings: { near: { value: 450, overRange: false } } })).toBe('451 Ω agrees with the earlier 450 Ω plus 105 mΩ of wire: 445–455 Ω.');
  });
});
