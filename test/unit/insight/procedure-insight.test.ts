import { describe, expect, it } from 'vitest';
import type { ProcedureDocument } from '@shared/engine/procedure';
import { expectedToFinding, median, orderSuggestion, procedureInsight, type CheckInsight, type InsightDiagnosis } from '@shared/insight/procedure-insight';

/**
 * Insight on small hand-made trees; every expected value is worked out by hand in the comments. Times are
 * invented minutes. The ordering rule is the sequential-testing result of Mitten (1960), from memory.
 */
const MIN = 60_000;
const T0 = Date.parse('2026-03-02T08:00:00Z');
const at = (min: number) => new Date(T0 + min * MIN).toISOString();

/** A → F1 or B; B → F2. Of the checks, the computation reads only which are findings. */
const doc: ProcedureDocument = {
  startCheckId: 'A',
  cautions: [],
  checks: [
    { id: 'A', kind: 'observe', title: 'A', instruction: '', choices: [{ id: 'x', label: 'x', next: 'F1' }, { id: 'y', label: 'y', next: 'B' }] },
    { id: 'B', kind: 'task', title: 'B', instruction: '', next: 'F2' },
    { id: 'F1', kind: 'finding', title: 'F1', instruction: '', finding: { part: 'p1', action: 'a1' } },
    { id: 'F2', kind: 'finding', title: 'F2', instruction: '', finding: { part: 'p2', action: 'a2' } },
  ],
};

/** A path of [checkId, nextCheckId, minute recorded, retracted?]; it ends at its last step's next check. */
function diagnosis(path: [string, string, number, boolean?][]): InsightDiagnosis {
  const live = path.filter((p) => !p[3]);
  const last = path[path.length - 1][2];
  return {
    startedAt: at(0),
    endedAt: at(last),
    findingCheckId: live[live.length - 1][1],
    steps: path.map(([checkId, nextCheckId, min, retracted]) => ({ checkId, nextCheckId, recordedAt: at(min), retracted: retracted ?? false })),
  };
}

describe('procedureInsight', () => {
  // Two cases end at A (2 min), two go on to B (4 more minutes).
  const cases = [diagnosis([['A', 'F1', 2]]), diagnosis([['A', 'F1', 2]]), diagnosis([['A', 'B', 2], ['B', 'F2', 6]]), diagnosis([['A', 'B', 2], ['B', 'F2', 6]])];
  const insight = procedureInsight(doc, cases);

  it('counts diagnoses, findings and the outcomes taken', () => {
    expect(insight.diagnoses).toBe(4);
    expect(insight.findings).toEqual([
      { checkId: 'F1', count: 2 },
      { checkId: 'F2', count: 2 },
    ]);
    expect(insight.edges).toEqual([
      { from: 'A', to: 'F1', count: 2 },
      { from: 'A', to: 'B', count: 2 },
      { from: 'B', to: 'F2', count: 2 },
    ]);
  });

  it('times checks and diagnoses by their medians', () => {
    expect(insight.checks.find((c) => c.checkId === 'A')).toMatchObject({ visits: 4, medianMs: 2 * MIN, decides: 0.5, meanPosition: 1 });
    expect(insight.checks.find((c) => c.checkId === 'B')).toMatchObject({ visits: 2, medianMs: 4 * MIN, decides: 1, meanPosition: 2 });
    // Durations 2, 2, 6, 6 min: the median is (2 + 6) / 2 = 4 min.
    expect(insight.medianDiagnosisMs).toBe(4 * MIN);
  });

  it('expects 1.5 checks and 4 minutes: N = 1 + ½·1, T = 2 + ½·4', () => {
    expect(insight.expected!.checks).toBeCloseTo(1.5, 12);
    expect(insight.expected!.ms / MIN).toBeCloseTo(4, 12);
  });

  it('adds the time of a step taken back to the step that replaced it, and leaves it off the counts', () => {
    // A typed at 2 min, taken back, typed again at 5 min: A took 5 minutes in all and ran once.
    const redo = procedureInsight(doc, [diagnosis([['A', 'F1', 2, true], ['A', 'B', 5], ['B', 'F2', 9]])]);
    expect(redo.checks.find((c) => c.checkId === 'A')).toMatchObject({ visits: 1, medianMs: 5 * MIN });
    expect(redo.edges.find((e) => e.from === 'A' && e.to === 'F1')).toBeUndefined();
  });
});

describe('expectedToFinding', () => {
  it('counts a re-test loop as often as it happened: N = 1 / 0.8 + 1 = 2.25, T = 1.25·1 + 3 = 4.25 min', () => {
    // A sends the technician back to A one time in five (p = 0.2), else on to B; B always ends at F.
    // N(A) = 1 + 0.2·N(A) + 0.8·N(B), N(B) = 1  →  N(A) = 1.8 / 0.8 = 2.25.
    // T(A) = 1 + 0.2·T(A) + 0.8·3             →  T(A) = 3.4 / 0.8 = 4.25 min.
    const edges = [
      { from: 'A', to: 'A', count: 1 },
      { from: 'A', to: 'B', count: 4 },
      { from: 'B', to: 'F', count: 4 },
    ];
    const e = expectedToFinding('A', edges, new Map([['A', 1 * MIN], ['B', 3 * MIN]]))!;
    expect(e.checks).toBeCloseTo(2.25, 12);
    expect(e.ms / MIN).toBeCloseTo(4.25, 12);
  });

  it('weighs three branches: N = 1 + 0.5·1 + 0.25·2 = 2, T = 2 + 0.5·1 + 0.25·(4 + 1) = 3.75 min', () => {
    // S → F (¼), S → C (½), S → D (¼); C → F; D → C. Times S 2, C 1, D 4 min.
    // N(C) = 1, N(D) = 1 + N(C) = 2, N(S) = 1 + ½·1 + ¼·2 = 2.
    // T(C) = 1, T(D) = 4 + 1 = 5, T(S) = 2 + ½·1 + ¼·5 = 3.75.
    const edges = [
      { from: 'S', to: 'F', count: 1 },
      { from: 'S', to: 'C', count: 2 },
      { from: 'S', to: 'D', count: 1 },
      { from: 'C', to: 'F', count: 3 },
      { from: 'D', to: 'C', count: 1 },
    ];
    const e = expectedToFinding('S', edges, new Map([['S', 2 * MIN], ['C', 1 * MIN], ['D', 4 * MIN]]))!;
    expect(e.checks).toBeCloseTo(2, 12);
    expect(e.ms / MIN).toBeCloseTo(3.75, 12);
  });

  it('says nothing when the first check never ran', () => {
    expect(expectedToFinding('A', [], new Map())).toBeNull();
  });
});

describe('orderSuggestion', () => {
  const check = (checkId: string, meanPosition: number, meanMin: number, decides: number): CheckInsight => ({
    checkId,
    visits: 5,
    medianMs: meanMin * MIN,
    meanMs: meanMin * MIN,
    decides,
    meanPosition,
  });

  it('points out the cheap, decisive check that runs after a costly one', () => {
    // Index = mean time / share decided: A 10 / 0 = ∞, B 2 / 0.5 = 4 min, C 1 / 1 = 1 min.
    // C has the best index but runs third; A, the worst, runs first.
    const s = orderSuggestion([check('A', 1, 10, 0), check('B', 2, 2, 0.5), check('C', 3, 1, 1)]);
    expect(s).toEqual({ checkId: 'C', afterCheckId: 'A', index: 1 * MIN, afterIndex: null });
  });

  it('is quiet when the order already follows the rule, or a check has too few visits to judge', () => {
    expect(orderSuggestion([check('A', 1, 1, 1), check('B', 2, 2, 0.5)])).toBeNull();
    expect(orderSuggestion([check('A', 1, 10, 0), { ...check('C', 3, 1, 1), visits: 1 }])).toBeNull();
  });
});

describe('median', () => {
  it('takes the middle value, or the mean of the two middle ones', () => {
    expect(median([3, 1, 2])).toBe(2);
    expect(median([4, 1, 3, 2])).toBe(2.5);
    expect(median([])).toBeNull();
  });
});
