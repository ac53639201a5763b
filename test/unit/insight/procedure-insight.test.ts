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

/**
 * A document in which each check leads to the listed checks (observations, one choice each) and every id
 * without exits is a finding; `retest` caps a check as the engine does.
 */
function chain(start: string, exits: Record<string, string[]>, retest: Record<string, { maxVisits: number; whenExhausted: string }> = {}): ProcedureDocument {
  const ids = new Set([start, ...Object.keys(exits), ...Object.values(exits).flat()]);
  return {
    startCheckId: start,
    cautions: [],
    checks: [...ids].map((id) =>
      exits[id]
        ? { id, kind: 'observe' as const, title: id, instruction: '', choices: exits[id].map((next) => ({ id: next, label: next, next })), ...(retest[id] ? { retest: retest[id] } : {}) }
        : { id, kind: 'finding' as const, title: id, instruction: '', finding: { part: id, action: id } },
    ),
  };
}

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
    const e = expectedToFinding(chain('A', { A: ['A', 'B'], B: ['F'] }), edges, new Map([['A', 1 * MIN], ['B', 3 * MIN]]))!;
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
    const e = expectedToFinding(chain('S', { S: ['F', 'C', 'D'], C: ['F'], D: ['C'] }), edges, new Map([['S', 2 * MIN], ['C', 1 * MIN], ['D', 4 * MIN]]))!;
    expect(e.checks).toBeCloseTo(2, 12);
    expect(e.ms / MIN).toBeCloseTo(3.75, 12);
  });

  it('says nothing when the first check never ran', () => {
    expect(expectedToFinding(chain('A', { A: ['F'] }), [], new Map())).toBeNull();
  });

  it('stops a capped re-measure loop at its visit limit: N = 1 + ½·1 = 1.5, T = 4 + ½·4 = 6 min', () => {
    // X measures again one time in two (X → X) or ends at F; X runs at most twice, then goes to F.
    // Uncapped this would be N = 1 / (1 − ½) = 2. Capped: visit 1 goes on to visit 2 with p = ½; on visit 2
    // the loop is used up, so both outcomes end at F: N = 1 + ½·1 = 1.5 checks, T = 4 + ½·4 = 6 minutes.
    const doc = chain('X', { X: ['X', 'F'] }, { X: { maxVisits: 2, whenExhausted: 'F' } });
    const edges = [
      { from: 'X', to: 'X', count: 1 },
      { from: 'X', to: 'F', count: 1 },
    ];
    const e = expectedToFinding(doc, edges, new Map([['X', 4 * MIN]]))!;
    expect(e.checks).toBeCloseTo(1.5, 12);
    expect(e.ms / MIN).toBeCloseTo(6, 12);
  });

  it('sends a loop through a task to the exhausted exit on the last pass: N = 3.352, T = 10.448 min', () => {
    // A → W (p = 0.6, a task that sends the technician back to A) or A → F (0.4); A runs at most 3 times,
    // then W goes on to G, and G → F2. Times A 2, W 5, G 3 min. Uncapped: N(A) = 1.6 / 0.4 = 4.
    // Capped, by how often A has run (A1, A2, A3), with N(G) = 1 and T(G) = 3:
    //   N(W|3) = 1 + N(G) = 2;       N(A3) = 1 + 0.6·2    = 2.2
    //   N(W|2) = 1 + 2.2 = 3.2;      N(A2) = 1 + 0.6·3.2  = 2.92
    //   N(W|1) = 1 + 2.92 = 3.92;    N(A1) = 1 + 0.6·3.92 = 3.352
    //   T(W|3) = 5 + 3 = 8;          T(A3) = 2 + 0.6·8     = 6.8
    //   T(W|2) = 5 + 6.8 = 11.8;     T(A2) = 2 + 0.6·11.8  = 9.08
    //   T(W|1) = 5 + 9.08 = 14.08;   T(A1) = 2 + 0.6·14.08 = 10.448
    // The one observed W → G was W entering the exhausted A, so W leads to A with p = 1.
    const doc = chain('A', { A: ['W', 'F'], W: ['A'], G: ['F2'] }, { A: { maxVisits: 3, whenExhausted: 'G' } });
    const edges = [
      { from: 'A', to: 'W', count: 3 },
      { from: 'A', to: 'F', count: 2 },
      { from: 'W', to: 'A', count: 2 },
      { from: 'W', to: 'G', count: 1 },
      { from: 'G', to: 'F2', count: 1 },
    ];
    const e = expectedToFinding(doc, edges, new Map([['A', 2 * MIN], ['W', 5 * MIN], ['G', 3 * MIN]]))!;
    expect(e.checks).toBeCloseTo(3.352, 12);
    expect(e.ms / MIN).toBeCloseTo(10.448, 12);
  });

  it('leaves a capped check that is on no observed loop as it is: N = 1 + ½ = 1.5', () => {
    // A (capped at 1 visit) → B or F, B → F: nothing returns to A, so the cap never bites.
    const doc = chain('A', { A: ['B', 'F'], B: ['F'] }, { A: { maxVisits: 1, whenExhausted: 'F' } });
    const e = expectedToFinding(doc, [{ from: 'A', to: 'B', count: 1 }, { from: 'A', to: 'F', count: 1 }, { from: 'B', to: 'F', count: 1 }], new Map())!;
    expect(e.checks).toBeCloseTo(1.5, 12);
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
