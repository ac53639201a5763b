import { describe, expect, it } from 'vitest';
import type { DiagnosisDetail, StepView } from '@shared/api/diagnosis-types';
import { decideStep } from '@shared/diagnosis/decide-step';
import { evaluate } from '@shared/engine/evaluate';
import { buildReport } from '@shared/report/report-model';
import { specInWords } from '@shared/report/spec-words';
import { FIXTURE_METER, fixtureProcedure } from '../../support/fixture-procedure';

const document = fixtureProcedure();

/** Runs typed inputs through decideStep the way the server records them; `retract` marks a step taken back. */
function detail(inputs: { checkId: string; reading?: string; choiceId?: string; note?: string; retract?: boolean }[]): DiagnosisDetail {
  const path: { checkId: string; value: number | null; overRange: boolean; uncertainty?: number }[] = [];
  const steps: StepView[] = inputs.map((input, i) => {
    const d = decideStep(document, input.checkId, input, { meterRanges: FIXTURE_METER.ranges as never, ambientC: 32, path });
    if (!d.ok) throw new Error(d.message);
    if (!input.retract) path.push({ checkId: input.checkId, value: d.value, overRange: d.overRange, uncertainty: d.evaluation?.uncertainty });
    return {
      id: `step-${i + 1}`,
      seq: i + 1,
      checkId: input.checkId,
      readingText: input.reading ?? null,
      valueSi: d.value,
      overRange: d.overRange,
      verdict: d.verdict,
      choiceId: d.choiceId,
      evaluation: d.evaluation,
      nextCheckId: d.nextCheckId,
      note: input.note ?? '',
      by: i < 2 ? 'Dario Lindqvist' : 'Tomás Reyes',
      recordedAt: new Date(Date.UTC(2026, 2, 3, 9, 10 + i)).toISOString(),
      retracted: input.retract === true,
      retractedAt: null,
    };
  });
  const machine = { id: 'm', make: 'Veltro', model: 'T650', year: 2019, engine: '', vin: '7VLTR65A5TK104233', mileage: 21400, mileageUnit: 'km' as const, vinWarning: null, createdAt: '' };
  return {
    id: 'd',
    status: 'concluded',
    procedureId: 'p',
    procedureTitle: 'No spark',
    versionNumber: 2,
    complaint: 'Turns over, never catches',
    customerName: 'Ada Quill',
    machine: '2019 Veltro T650',
    startedBy: 'Dario Lindqvist',
    startedAt: '2026-03-03T09:00:00.000Z',
    endedAt: '2026-03-03T10:50:00.000Z',
    currentCheckId: 'ok',
    finding: 'Ignition circuit proven',
    stepCount: steps.filter((s) => !s.retracted).length,
    ambientC: 32,
    job: { id: 'j', reference: 'WO-7', customerName: 'Ada Quill', customerContact: '', customerEmail: 'ada@quill.example', complaint: 'Turns over, never catches', machine, createdAt: '' },
    meter: { id: 'mt', name: 'Test meter', model: 'TM-6000', ranges: FIXTURE_METER.ranges as never, createdAt: '' },
    document,
    steps,
    photos: [
      { id: 'ph1', stepId: 'step-2', contentType: 'image/jpeg', size: 1, createdAt: '' },
      { id: 'ph2', stepId: null, contentType: 'image/png', size: 1, createdAt: '' },
      { id: 'ph3', stepId: 'step-1', contentType: 'image/png', size: 1, createdAt: '' },
    ],
    conclusion: { findingCheckId: 'ok', note: 'Proven.', parts: '', labourMinutes: null },
    abandonReason: null,
  };
}

const run = detail([
  { checkId: 'coil', reading: '0,60 kΩ', retract: true },
  { checkId: 'coil', reading: '455 ohm', note: 'Leads nulled.' },
  { checkId: 'spark', choiceId: 'none' },
  { checkId: 'unplug' },
  { checkId: 'diode-fwd', reading: '0.58' },
  { checkId: 'diode-rev', reading: 'OL' },
]);

describe('the report model', () => {
  const report = buildReport(run);

  it('lists the checks that counted, numbered, with what was typed, picked or done, and leaves the retracted one out', () => {
    expect(report.lines.map((l) => [l.number, l.title, l.result])).toEqual([
      [1, 'Pickup coil resistance', '455 ohm'],
      [2, 'Spark at the tester', 'No flash'],
      [3, 'Unplug the interlock diode', 'Done'],
      [4, 'Diode forward', '0.58'],
      [5, 'Diode reverse', 'OL'],
    ]);
    expect(report.retakenCount).toBe(1);
  });

  it('words the spec with the limits actually used (copper window corrected to 32 °C) and the verdict', () => {
    // 400–500 Ω at 20 °C × (1 + 0.00393 × 12): IEC 60028 annealed-copper coefficient, as in the engine's tests.
    expect(report.lines[0]).toMatchObject({ spec: '419–524 Ω at 32 °C', verdict: 'in_spec', verdictWords: 'In spec', note: 'Leads nulled.' });
    expect(report.lines[0].explanation).toContain('455 Ω is within');
    expect(report.lines[4]).toMatchObject({ spec: 'Reverse reading at least 10× the forward reading', verdict: 'in_spec' });
    expect(report.lines[1]).toMatchObject({ spec: null, verdict: null, measure: null });
  });

  it('puts each photo with its step; photos of the whole diagnosis or of a retracted step go under Photos', () => {
    expect(report.lines[0].photos.map((p) => p.id)).toEqual(['ph1']);
    expect(report.photos.map((p) => p.id)).toEqual(['ph2', 'ph3']);
  });

  it('names the finding, the machine, everyone who took a reading, and the time from start to end when no labour was booked', () => {
    expect(report.finding).toEqual({ title: 'Ignition circuit proven', part: 'None', action: 'Look at fuel and compression.' });
    expect(report.machine).toEqual({ title: '2019 Veltro T650', engine: '', vin: '7VLTR65A5TK104233', mileage: '21,400 km' });
    expect(report.technicians).toEqual(['Dario Lindqvist', 'Tomás Reyes']);
    expect(report.labour).toBeNull();
    expect(report.timeSpent).toBe('1 h 50 min');
  });

  it('gives the labour booked as the time spent', () => {
    const booked = buildReport({ ...run, conclusion: { ...run.conclusion!, labourMinutes: 60 } });
    expect([booked.labour, booked.timeSpent]).toEqual(['1 h', '1 h']);
  });
});

describe('a spec in words', () => {
  const noReading = (spec: Parameters<typeof evaluate>[0]) => evaluate(spec, { value: 1, overRange: false, quantity: 'resistance' });
  it.each([
    [{ kind: 'at_most', max: 0.5 } as const, 'At most 500 mΩ'],
    [{ kind: 'at_least', min: 1e6 } as const, 'At least 1 MΩ'],
    [{ kind: 'expect_open' } as const, 'Open circuit (OL)'],
    [{ kind: 'expect_continuity', max: 1 } as const, 'Continuity: at most 1 Ω'],
    [{ kind: 'record_only' } as const, 'Recorded for reference; no spec'],
    [{ kind: 'nominal', nominal: 1000, tolPct: 10 } as const, '900 Ω–1.10 kΩ'],
  ])('%j reads "%s"', (spec, words) => {
    expect(specInWords(spec, 'resistance', noReading(spec))).toBe(words);
  });
});
