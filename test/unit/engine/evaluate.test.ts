import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { decide, readingUncertainty, type MeterAccuracy } from '@shared/engine/accuracy';
import { evaluate, type ReadingValue } from '@shared/engine/evaluate';
import { requiredVerdicts } from '@shared/engine/outcomes';
import type { MeasureCheck } from '@shared/engine/procedure';
import { QUANTITIES, type Quantity } from '@shared/engine/quantity';
import type { Spec } from '@shared/engine/spec';

const ohms = (value: number): ReadingValue => ({ value, overRange: false, quantity: 'resistance' });
const volts = (value: number): ReadingValue => ({ value, overRange: false, quantity: 'voltage_dc' });
const OL = (quantity: Quantity = 'resistance'): ReadingValue => ({ value: null, overRange: true, quantity });
/** ±(1 % + 2 counts) on a 0.1 Ω-resolution range: invented demo meter. */
const meter: MeterAccuracy = { pctOfReading: 1, counts: 2, resolution: 0.1 };

describe('decide (guard bands)', () => {
  it('is in spec only when the whole interval is inside', () => {
    expect(decide(450, 5, 400, 500)).toBe('in_spec');
    expect(decide(497, 5, 400, 500)).toBe('marginal_high');
    expect(decide(403, 5, 400, 500)).toBe('marginal_low');
  });

  it('is low or high only when the whole interval is outside', () => {
    expect(decide(394, 5, 400, 500)).toBe('low');
    expect(decide(506, 5, 400, 500)).toBe('high');
  });

  it('treats limits as inclusive when there is no uncertainty', () => {
    expect(decide(400, 0, 400, 500)).toBe('in_spec');
    expect(decide(500, 0, 400, 500)).toBe('in_spec');
    expect(decide(500.0001, 0, 400, 500)).toBe('high');
  });

  it('leans to the nearer limit when the interval is wider than the window', () => {
    expect(decide(420, 100, 400, 500)).toBe('marginal_low');
    expect(decide(480, 100, 400, 500)).toBe('marginal_high');
  });

  it('works with one-sided limits', () => {
    expect(decide(3, 0.5, null, 5)).toBe('in_spec');
    expect(decide(5.2, 0.5, null, 5)).toBe('marginal_high');
    expect(decide(5.2, 0.5, 5, null)).toBe('marginal_low');
  });
});

describe('readingUncertainty', () => {
  it('is ±(% of reading + counts × resolution), zero with no meter known', () => {
    expect(readingUncertainty(480, meter)).toBeCloseTo(4.8 + 0.2, 12);
    expect(readingUncertainty(-480, meter)).toBeCloseTo(5.0, 12);
    expect(readingUncertainty(480, undefined)).toBe(0);
  });
});

describe('evaluate: window and nominal', () => {
  const window: Spec = { kind: 'window', min: 400, max: 500 };

  it('gives in_spec, low and high with the limits used', () => {
    expect(evaluate(window, ohms(480))).toMatchObject({ verdict: 'in_spec', compared: 480, limits: { min: 400, max: 500 } });
    expect(evaluate(window, ohms(380)).verdict).toBe('low');
    expect(evaluate(window, ohms(520)).verdict).toBe('high');
  });

  it('compares in SI whatever prefix the spec and reading were typed in', () => {
    // 0.48 kΩ and 480 Ω are the same reading once parsed; the spec is stored in Ω.
    expect(evaluate({ kind: 'window', min: 0.4e3, max: 0.5e3 }, ohms(480)).verdict).toBe('in_spec');
  });

  it('calls a reading marginal when the meter’s uncertainty straddles a limit, and says which way it leans', () => {
    const e = evaluate(window, ohms(497), { accuracy: meter });
    expect(e.verdict).toBe('marginal');
    expect(e.leans).toBe('high');
    expect(e.uncertainty).toBeCloseTo(5.17, 10);
    expect(e.interval?.low).toBeCloseTo(491.83, 10);
    expect(e.interval?.high).toBeCloseTo(502.17, 10);
    expect(evaluate(window, ohms(404), { accuracy: meter })).toMatchObject({ verdict: 'marginal', leans: 'low' });
  });

  it('reads over range as open on a resistance check and as high on a voltage check', () => {
    expect(evaluate(window, OL()).verdict).toBe('open');
    expect(evaluate({ kind: 'window', min: 12, max: 14.8 }, OL('voltage_dc')).verdict).toBe('high');
  });

  it('corrects copper limits quoted at 20 °C to the ambient temperature', () => {
    const spec: Spec = { kind: 'window', min: 400, max: 500, copperAt20C: true };
    const e = evaluate(spec, ohms(520), { ambientC: 40 });
    expect(e.limits.min).toBeCloseTo(431.44, 9);
    expect(e.limits.max).toBeCloseTo(539.3, 9);
    expect(e.correctedToC).toBe(40);
    expect(e.verdict).toBe('in_spec'); // high at 20 °C, fine for a winding at 40 °C
    expect(evaluate(spec, ohms(520)).verdict).toBe('high'); // no ambient known: limits stay as written
    expect(evaluate(spec, ohms(520)).correctedToC).toBeNull();
    expect(evaluate({ kind: 'window', min: 400, max: 500 }, ohms(520), { ambientC: 40 }).correctedToC).toBeNull();
  });

  it('builds limits from nominal ± percent or ± units', () => {
    expect(evaluate({ kind: 'nominal', nominal: 3.5, tolPct: 10 }, ohms(3.2)).limits).toEqual({ min: 3.15, max: 3.85 });
    expect(evaluate({ kind: 'nominal', nominal: 3.5, tolPct: 10 }, ohms(3.1)).verdict).toBe('low');
    const abs = evaluate({ kind: 'nominal', nominal: 5, tolAbs: 0.25 }, volts(5.3));
    expect(abs).toMatchObject({ verdict: 'high', limits: { min: 4.75, max: 5.25 } });
  });
});

describe('evaluate: one-sided, open and continuity specs', () => {
  it('at_most: passes below, high above, open on OL for resistance', () => {
    const spec: Spec = { kind: 'at_most', max: 0.2 };
    expect(evaluate(spec, volts(0.15)).verdict).toBe('in_spec');
    expect(evaluate(spec, volts(0.25)).verdict).toBe('high');
    expect(evaluate(spec, OL('voltage_dc')).verdict).toBe('high');
    expect(evaluate({ kind: 'at_most', max: 1 }, OL()).verdict).toBe('open');
  });

  it('at_least: over range is above any minimum', () => {
    const spec: Spec = { kind: 'at_least', min: 1e6 };
    expect(evaluate(spec, ohms(2e6)).verdict).toBe('in_spec');
    expect(evaluate(spec, ohms(5e5)).verdict).toBe('low');
    expect(evaluate(spec, OL()).verdict).toBe('in_spec');
  });

  it('expect_open: OL passes; a finite reading is low unless at or above the open threshold', () => {
    expect(evaluate({ kind: 'expect_open' }, OL()).verdict).toBe('in_spec');
    expect(evaluate({ kind: 'expect_open' }, ohms(2e6)).verdict).toBe('low');
    const threshold: Spec = { kind: 'expect_open', openAbove: 1e6 };
    expect(evaluate(threshold, ohms(2e6)).verdict).toBe('in_spec');
    expect(evaluate(threshold, ohms(1.2e3)).verdict).toBe('low');
    expect(evaluate(threshold, ohms(0.995e6), { accuracy: { pctOfReading: 1, counts: 0, resolution: 1 } })).toMatchObject({ verdict: 'marginal', leans: 'low' });
  });

  it('expect_continuity: below the threshold passes, above is high, OL is open', () => {
    const spec: Spec = { kind: 'expect_continuity', max: 1 };
    expect(evaluate(spec, { value: 0.3, overRange: false, quantity: 'continuity' }).verdict).toBe('in_spec');
    expect(evaluate(spec, { value: 12, overRange: false, quantity: 'continuity' }).verdict).toBe('high');
    expect(evaluate(spec, OL('continuity')).verdict).toBe('open');
  });

  it('record_only: anything recorded is in spec', () => {
    expect(evaluate({ kind: 'record_only' }, volts(-3)).verdict).toBe('in_spec');
    expect(evaluate({ kind: 'record_only' }, OL()).verdict).toBe('in_spec');
  });

  it('no reading, or a value that is not a number, gives no_reading', () => {
    expect(evaluate({ kind: 'window', min: 1, max: 2 }, null).verdict).toBe('no_reading');
    expect(evaluate({ kind: 'record_only' }, null).verdict).toBe('no_reading');
    expect(evaluate({ kind: 'window', min: 1, max: 2 }, { value: Number.NaN, overRange: false, quantity: 'resistance' }).verdict).toBe('no_reading');
  });
});

describe('evaluate: ratio (diode read both ways)', () => {
  const spec: Spec = { kind: 'ratio', pairWith: 'fwd', minRatio: 10 };
  const diode = (value: number | null): ReadingValue => ({ value, overRange: value === null, quantity: 'diode' });
  const withForward = (value: number | null, uncertainty?: number) => ({ readings: { fwd: { value, overRange: value === null, uncertainty } } });

  it('passes a high reverse/forward ratio and reports the ratio', () => {
    const e = evaluate(spec, diode(8), withForward(0.55));
    expect(e.verdict).toBe('in_spec');
    expect(e.compared).toBeCloseTo(14.545, 3);
    expect(e.reference).toBe(0.55);
  });

  it('passes OL on the reverse side', () => {
    expect(evaluate(spec, diode(null), withForward(0.55)).verdict).toBe('in_spec');
  });

  it('fails a part that reads about the same both ways (shorted)', () => {
    expect(evaluate(spec, diode(0.004), withForward(0.003)).verdict).toBe('low');
    expect(evaluate(spec, diode(0), withForward(0)).verdict).toBe('low');
  });

  it('calls OL both ways open and OL only forward low (reads backwards)', () => {
    expect(evaluate(spec, diode(null), withForward(null)).verdict).toBe('open');
    expect(evaluate(spec, diode(0.55), withForward(null)).verdict).toBe('low');
  });

  it('is marginal when both readings’ uncertainty straddles the minimum ratio', () => {
    const acc: MeterAccuracy = { pctOfReading: 1, counts: 3, resolution: 0.001 };
    const e = evaluate(spec, diode(5.6), { ...withForward(0.55, 0.0085), accuracy: acc });
    // ratio 10.18; U = (0.059 + 10.18·0.0085)/0.55 ≈ 0.265
    expect(e.verdict).toBe('marginal');
    expect(e.uncertainty).toBeCloseTo((0.059 + (5.6 / 0.55) * 0.0085) / 0.55, 10);
  });

  it('has no reading to compare with when the forward check was not measured', () => {
    expect(evaluate(spec, diode(8)).verdict).toBe('no_reading');
  });
});

describe('evaluate: agreement with an earlier reading', () => {
  it('expects the earlier reading plus the wire resistance, within tolerance', () => {
    const spec: Spec = { kind: 'agree_with', checkId: 'near', tolAbs: 0.05, wire: { gauge: { system: 'awg', size: 18 }, lengthM: 5 } };
    const ctx = { readings: { near: { value: 0.4, overRange: false } } };
    const e = evaluate(spec, ohms(0.5), ctx);
    expect(e.wireResistance).toBeCloseTo(0.10474, 4);
    expect(e.expected).toBeCloseTo(0.50474, 4);
    expect(e.verdict).toBe('in_spec');
    expect(evaluate(spec, ohms(0.9), ctx).verdict).toBe('high');
    expect(evaluate(spec, ohms(0.3), ctx).verdict).toBe('low');
    expect(evaluate(spec, OL(), ctx).verdict).toBe('open');
  });

  it('corrects the wire resistance to the ambient temperature', () => {
    const spec: Spec = { kind: 'agree_with', checkId: 'near', tolAbs: 0.05, wire: { gauge: { system: 'mm2', size: 0.5 }, lengthM: 2 } };
    const e = evaluate(spec, ohms(0.1), { ambientC: 40, readings: { near: { value: 0, overRange: false } } });
    expect(e.wireResistance).toBeCloseTo((2 / 58 / 0.5) * 1.0786, 10);
    expect(e.correctedToC).toBe(40);
  });

  it('uses a percentage of the expected value as tolerance', () => {
    const spec: Spec = { kind: 'agree_with', checkId: 'near', tolPct: 5 };
    const e = evaluate(spec, volts(12.1), { readings: { near: { value: 12.6, overRange: false } } });
    expect(e.limits.min).toBeCloseTo(11.97, 10);
    expect(e.verdict).toBe('in_spec');
  });

  it('adds both readings’ uncertainty before deciding', () => {
    const spec: Spec = { kind: 'agree_with', checkId: 'near', tolAbs: 0.1 };
    const ctx = { readings: { near: { value: 12, overRange: false, uncertainty: 0.05 } } };
    expect(evaluate(spec, volts(12.08), ctx).verdict).toBe('marginal');
    expect(evaluate(spec, volts(12.04), ctx).verdict).toBe('in_spec');
  });

  it('agrees when both ends are open; a finite reading against an open earlier end is low', () => {
    const spec: Spec = { kind: 'agree_with', checkId: 'near', tolAbs: 1 };
    const ctx = { readings: { near: { value: null, overRange: true } } };
    expect(evaluate(spec, OL(), ctx).verdict).toBe('in_spec');
    expect(evaluate(spec, ohms(3), ctx).verdict).toBe('low');
    expect(evaluate(spec, ohms(3)).verdict).toBe('no_reading');
  });
});

describe('evaluate: properties', () => {
  const rank = { low: 0, marginal: 1, in_spec: 2, high: 4 } as const;

  it('is monotone in the reading for a window: low ≤ marginal(low) ≤ in_spec ≤ marginal(high) ≤ high', () => {
    const order = (e: ReturnType<typeof evaluate>) =>
      e.verdict === 'marginal' ? (e.leans === 'low' ? 1 : 3) : rank[e.verdict as keyof typeof rank];
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 1e4, noNaN: true }),
        fc.double({ min: 1e-3, max: 1e4, noNaN: true }),
        fc.double({ min: -1e5, max: 1e5, noNaN: true }),
        fc.double({ min: -1e5, max: 1e5, noNaN: true }),
        fc.double({ min: 0, max: 5, noNaN: true }),
        fc.integer({ min: 0, max: 5 }),
        (min, width, a, b, pct, counts) => {
          const spec: Spec = { kind: 'window', min, max: min + width };
          const ctx = { accuracy: { pctOfReading: pct, counts, resolution: 0.01 } };
          const [lo, hi] = a <= b ? [a, b] : [b, a];
          return order(evaluate(spec, volts(lo), ctx)) <= order(evaluate(spec, volts(hi), ctx));
        },
      ),
      { numRuns: 3000 },
    );
  });

  const specs: fc.Arbitrary<Spec> = fc.oneof(
    fc.record({ kind: fc.constant('window' as const), min: fc.double({ min: 0, max: 100, noNaN: true }), max: fc.double({ min: 101, max: 1000, noNaN: true }), copperAt20C: fc.boolean() }),
    fc.record({ kind: fc.constant('nominal' as const), nominal: fc.double({ min: 0, max: 100, noNaN: true }), tolPct: fc.double({ min: 0, max: 50, noNaN: true }) }),
    fc.record({ kind: fc.constant('at_most' as const), max: fc.double({ min: 0.01, max: 100, noNaN: true }) }),
    fc.record({ kind: fc.constant('at_least' as const), min: fc.double({ min: 0, max: 100, noNaN: true }) }),
    fc.record({ kind: fc.constant('expect_open' as const), openAbove: fc.option(fc.double({ min: 1, max: 1e6, noNaN: true }), { nil: undefined }) }),
    fc.record({ kind: fc.constant('expect_continuity' as const), max: fc.double({ min: 0.01, max: 10, noNaN: true }) }),
    fc.constant({ kind: 'record_only' as const }),
    fc.record({ kind: fc.constant('ratio' as const), pairWith: fc.constant('ref'), minRatio: fc.double({ min: 1.01, max: 100, noNaN: true }) }),
    fc.record({ kind: fc.constant('agree_with' as const), checkId: fc.constant('ref'), tolAbs: fc.double({ min: 0, max: 5, noNaN: true }) }),
  );
  const readingOf = (quantity: Quantity) =>
    fc.oneof(
      fc.double({ min: 0, max: 2e3, noNaN: true }).map((value): ReadingValue => ({ value, overRange: false, quantity })),
      fc.constant<ReadingValue>({ value: null, overRange: true, quantity }),
    );
  const prior = fc.oneof(
    fc.double({ min: 0, max: 2e3, noNaN: true }).map((value) => ({ value, overRange: false, uncertainty: 0.1 })),
    fc.constant({ value: null, overRange: true }),
  );

  it('only produces verdicts a check with that spec must have outcomes for (or no_reading)', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...QUANTITIES).chain((q) => fc.tuple(fc.constant(q), readingOf(q))),
        specs,
        prior,
        fc.double({ min: 0, max: 5, noNaN: true }),
        fc.double({ min: -20, max: 120, noNaN: true }),
        ([quantity, reading], spec, ref, pct, ambientC) => {
          const check = { kind: 'measure', quantity, spec, outcomes: {} } as MeasureCheck;
          const e = evaluate(spec, reading, { accuracy: { pctOfReading: pct, counts: 2, resolution: 0.1 }, ambientC, readings: { ref } });
          return e.verdict === 'no_reading' || requiredVerdicts(check, 'branch').includes(e.verdict);
        },
      ),
      { numRuns: 5000 },
    );
  });
});
