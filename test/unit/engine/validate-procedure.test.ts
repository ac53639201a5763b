import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Check, MeasureCheck, ProcedureDocument } from '@shared/engine/procedure';
import { validateProcedure, type ProblemCode } from '@shared/engine/validate-procedure';
import { generateProcedure } from '../../support/generate-procedure';
import { demoProcedure } from './demo-procedure';

function check<K extends Check['kind']>(doc: ProcedureDocument, id: string, kind: K): Extract<Check, { kind: K }> {
  const found = doc.checks.find((c) => c.id === id);
  if (found?.kind !== kind) throw new Error(`${id} is not a ${kind} check`);
  return found as Extract<Check, { kind: K }>;
}

function problems(doc: ProcedureDocument) {
  return validateProcedure(doc).map(({ checkId, code }) => ({ checkId, code }));
}

/** Validate after `edit` and expect exactly the listed problems. */
function expectProblems(edit: (doc: ProcedureDocument) => void, expected: { checkId: string; code: ProblemCode }[]) {
  const doc = demoProcedure();
  edit(doc);
  expect(problems(doc)).toEqual(expected);
}

describe('validateProcedure: the demo procedure', () => {
  it('is accepted as it stands', () => {
    expect(validateProcedure(demoProcedure())).toEqual([]);
  });
});

describe('validateProcedure: structure', () => {
  it('duplicate_id: two checks with one id', () => {
    expectProblems((d) => d.checks.push({ ...check(d, 'f-ecu', 'finding') }), [{ checkId: 'f-ecu', code: 'duplicate_id' }]);
  });

  it('missing_start: the start check does not exist', () => {
    expectProblems((d) => (d.startCheckId = 'nowhere'), [{ checkId: 'nowhere', code: 'missing_start' }]);
  });

  it('dangling_outcome: an outcome leads to a check that does not exist', () => {
    const doc = demoProcedure();
    check(doc, 'diode-fwd', 'measure').outcomes.high = 'f-diod';
    const found = validateProcedure(doc);
    expect(found).toEqual([expect.objectContaining({ checkId: 'diode-fwd', code: 'dangling_outcome' })]);
    expect(found[0].message).toMatch(/high outcome leads to “f-diod”, which doesn't exist/);
  });

  it('dangling_outcome: a choice or a task step leads nowhere', () => {
    expectProblems(
      (d) => {
        check(d, 'spark', 'observe').choices[0].next = 'x';
        check(d, 'reseat', 'task').next = 'y';
      },
      [
        { checkId: 'spark', code: 'dangling_outcome' },
        { checkId: 'reseat', code: 'dangling_outcome' },
        { checkId: 'f-fuel', code: 'unreachable' },
      ],
    );
  });

  it('missing_outcome: a measure check lacks an outcome for a verdict it can produce', () => {
    const doc = demoProcedure();
    delete check(doc, 'ckp-ohms', 'measure').outcomes.open;
    const found = validateProcedure(doc);
    expect(found.map((p) => [p.checkId, p.code])).toEqual([['ckp-ohms', 'missing_outcome']]);
    expect(found[0].message).toMatch(/come out .*open/);
  });

  it('missing_outcome: marginal needs an outcome under the branch policy only', () => {
    expectProblems((d) => (check(d, 'diode-fwd', 'measure').marginalPolicy = 'branch'), [{ checkId: 'diode-fwd', code: 'missing_outcome' }]);
    expectProblems((d) => (check(d, 'diode-fwd', 'measure').marginalPolicy = 'pass'), []);
  });

  it('dead_end: an observation with no choices', () => {
    expectProblems(
      (d) => (check(d, 'spark', 'observe').choices = []),
      [{ checkId: 'spark', code: 'dead_end' }, ...['battery', 'ckp-ohms', 'reseat', 'ckp-ecu', 'diode-fwd', 'diode-rev', 'f-fuel', 'f-battery', 'f-ckp', 'f-harness', 'f-diode', 'f-ecu'].map((checkId) => ({ checkId, code: 'unreachable' as const }))],
    );
  });

  it('duplicate_choice: two choices with one id', () => {
    expectProblems((d) => (check(d, 'spark', 'observe').choices[1].id = 'flash'), [{ checkId: 'spark', code: 'duplicate_choice' }]);
  });

  it('unreachable: no path from the start', () => {
    expectProblems(
      (d) => d.checks.push({ id: 'orphan', kind: 'finding', title: 'Orphan', instruction: '', finding: { part: 'x', action: 'y' } }),
      [{ checkId: 'orphan', code: 'unreachable' }],
    );
  });

  it('cycle: a loop without a re-test check', () => {
    const doc = demoProcedure();
    delete check(doc, 'ckp-ohms', 'measure').retest;
    const found = validateProcedure(doc);
    expect(found.map((p) => [p.checkId, p.code])).toEqual([['ckp-ohms', 'cycle']]);
    expect(found[0].message).toMatch(/“ckp-ohms”, “reseat” form a loop with no limit/);
  });

  it('cycle: a re-test whose exit leads back into the loop', () => {
    const doc = demoProcedure();
    check(doc, 'ckp-ohms', 'measure').retest = { maxVisits: 2, whenExhausted: 'reseat' };
    const found = validateProcedure(doc);
    expect(found.map((p) => [p.checkId, p.code])).toEqual([['reseat', 'cycle']]);
    expect(found[0].message).toMatch(/never ends: after the last re-test the diagnosis comes back into it/);
  });

  it('cycle: a check that leads to itself', () => {
    const doc = demoProcedure();
    check(doc, 'battery', 'measure').outcomes.low = 'battery';
    const found = validateProcedure(doc);
    expect(found.map((p) => [p.checkId, p.code])).toEqual([
      ['f-battery', 'unreachable'],
      ['battery', 'cycle'],
    ]);
    expect(found[1].message).toMatch(/“battery” leads back to itself/);
  });

  it('bad_retest: a visit limit below 1, an exit that does not exist, an exit that is itself a re-test', () => {
    expectProblems((d) => (check(d, 'ckp-ohms', 'measure').retest = { maxVisits: 0, whenExhausted: 'f-ckp' }), [
      { checkId: 'ckp-ohms', code: 'bad_retest' },
      { checkId: 'ckp-ohms', code: 'cycle' },
    ]);
    expectProblems((d) => (check(d, 'ckp-ohms', 'measure').retest = { maxVisits: 2, whenExhausted: 'gone' }), [
      { checkId: 'ckp-ohms', code: 'bad_retest' },
      { checkId: 'ckp-ohms', code: 'cycle' },
    ]);
    expectProblems((d) => (check(d, 'ckp-ohms', 'measure').retest = { maxVisits: 2, whenExhausted: 'ckp-ohms' }), [
      { checkId: 'ckp-ohms', code: 'bad_retest' },
      { checkId: 'ckp-ohms', code: 'cycle' },
    ]);
  });
});

describe('validateProcedure: specs', () => {
  const ckp = (d: ProcedureDocument) => check(d, 'ckp-ohms', 'measure');

  it('bad_window: minimum not below maximum', () => {
    expectProblems((d) => (ckp(d).spec = { kind: 'window', min: 500, max: 400 }), [{ checkId: 'ckp-ohms', code: 'bad_window' }]);
  });

  it('bad_window: a negative limit on a quantity that cannot be negative', () => {
    expectProblems((d) => (ckp(d).spec = { kind: 'window', min: -1, max: 400 }), [{ checkId: 'ckp-ohms', code: 'bad_window' }]);
    expectProblems((d) => (ckp(d).spec = { kind: 'at_most', max: 0 }), [{ checkId: 'ckp-ohms', code: 'bad_window' }]);
  });

  it('bad_window: a limit that is not a finite number', () => {
    expectProblems((d) => (ckp(d).spec = { kind: 'window', min: Number.NaN, max: 400 }), [{ checkId: 'ckp-ohms', code: 'bad_window' }]);
  });

  it('bad_tolerance: nominal with both, neither or a negative tolerance', () => {
    expectProblems((d) => (ckp(d).spec = { kind: 'nominal', nominal: 450, tolPct: 10, tolAbs: 5 }), [{ checkId: 'ckp-ohms', code: 'bad_tolerance' }]);
    expectProblems((d) => (ckp(d).spec = { kind: 'nominal', nominal: 450 }), [{ checkId: 'ckp-ohms', code: 'bad_tolerance' }]);
    expectProblems((d) => (ckp(d).spec = { kind: 'nominal', nominal: 450, tolPct: -5 }), [{ checkId: 'ckp-ohms', code: 'bad_tolerance' }]);
  });

  it('bad_tolerance: agreement without a tolerance', () => {
    expectProblems((d) => delete (check(d, 'ckp-ecu', 'measure').spec as { tolAbs?: number }).tolAbs, [{ checkId: 'ckp-ecu', code: 'bad_tolerance' }]);
  });

  it('bad_spec: a ratio of 1 or less, a wire of no length or an unknown size, an open threshold of 0', () => {
    expectProblems((d) => (check(d, 'diode-rev', 'measure').spec = { kind: 'ratio', pairWith: 'diode-fwd', minRatio: 1 }), [{ checkId: 'diode-rev', code: 'bad_spec' }]);
    expectProblems(
      (d) => (check(d, 'ckp-ecu', 'measure').spec = { kind: 'agree_with', checkId: 'ckp-ohms', tolAbs: 5, wire: { gauge: { system: 'awg', size: 19.5 }, lengthM: 0 } }),
      [{ checkId: 'ckp-ecu', code: 'bad_spec' }, { checkId: 'ckp-ecu', code: 'bad_spec' }],
    );
    expectProblems((d) => (ckp(d).spec = { kind: 'expect_open', openAbove: 0 }), [{ checkId: 'ckp-ohms', code: 'bad_spec' }]);
  });

  it('unit_mismatch: a spec in another unit than the check reads', () => {
    const doc = demoProcedure();
    ckp(doc).spec = { kind: 'window', min: 400, max: 500, unit: 'V' };
    const found = validateProcedure(doc);
    expect(found.map((p) => [p.checkId, p.code])).toEqual([['ckp-ohms', 'unit_mismatch']]);
    expect(found[0].message).toMatch(/spec is in V but the check reads resistance \(Ω\)/);
  });

  it('unit_mismatch: a meter function that does not read the quantity', () => {
    expectProblems((d) => (ckp(d).meterFunction = 'dc_volts'), [{ checkId: 'ckp-ohms', code: 'unit_mismatch' }]);
  });

  it('unit_mismatch: copper correction, open circuit, continuity or wire on a voltage check', () => {
    const battery = (d: ProcedureDocument) => check(d, 'battery', 'measure');
    expectProblems((d) => (battery(d).spec = { kind: 'at_least', min: 12.4, copperAt20C: true }), [{ checkId: 'battery', code: 'unit_mismatch' }]);
    expectProblems((d) => (battery(d).spec = { kind: 'expect_open' }), [{ checkId: 'battery', code: 'unit_mismatch' }]);
    expectProblems((d) => (battery(d).spec = { kind: 'expect_continuity', max: 1 }), [{ checkId: 'battery', code: 'missing_outcome' }, { checkId: 'battery', code: 'unit_mismatch' }]);
  });

  it('unit_mismatch: wire resistance added to a voltage agreement', () => {
    expectProblems(
      (d) => {
        const c = check(d, 'ckp-ecu', 'measure');
        c.quantity = 'voltage_dc';
        c.meterFunction = 'dc_volts';
        c.spec = { kind: 'agree_with', checkId: 'battery', tolAbs: 0.2, wire: { gauge: { system: 'awg', size: 18 }, lengthM: 1 } };
      },
      [{ checkId: 'ckp-ecu', code: 'unit_mismatch' }],
    );
  });

  it('range_too_small: the chosen range cannot show the spec’s limit', () => {
    const doc = demoProcedure();
    ckp(doc).range = 200;
    const found = validateProcedure(doc);
    expect(found.map((p) => [p.checkId, p.code])).toEqual([['ckp-ohms', 'range_too_small']]);
    expect(found[0].message).toMatch(/The 200 Ω range can't show 500 Ω/);
  });
});

describe('validateProcedure: earlier-reading references', () => {
  it('bad_reference: a check that does not exist, the check itself, a check without a reading, another quantity', () => {
    const rev = (d: ProcedureDocument) => check(d, 'diode-rev', 'measure');
    expectProblems((d) => (rev(d).spec = { kind: 'ratio', pairWith: 'gone', minRatio: 10 }), [{ checkId: 'diode-rev', code: 'bad_reference' }]);
    expectProblems((d) => (rev(d).spec = { kind: 'ratio', pairWith: 'diode-rev', minRatio: 10 }), [{ checkId: 'diode-rev', code: 'bad_reference' }]);
    expectProblems((d) => (rev(d).spec = { kind: 'ratio', pairWith: 'spark', minRatio: 10 }), [{ checkId: 'diode-rev', code: 'bad_reference' }]);
    expectProblems((d) => (rev(d).spec = { kind: 'ratio', pairWith: 'ckp-ohms', minRatio: 10 }), [{ checkId: 'diode-rev', code: 'bad_reference' }]);
  });

  it('reference_not_dominating: some path reaches the check without passing the referenced one', () => {
    // A shortcut from the battery check straight to the control-unit check skips the sensor check it compares with.
    const doc = demoProcedure();
    check(doc, 'battery', 'measure').outcomes.high = 'ckp-ecu';
    const found = validateProcedure(doc);
    expect(found.map((p) => [p.checkId, p.code])).toEqual([['ckp-ecu', 'reference_not_dominating']]);
    expect(found[0].message).toMatch(/without passing “ckp-ohms”/);
  });

  it('accepts a reference to a re-measured check past the exit of its loop: the exit is only taken after a visit', () => {
    const doc: ProcedureDocument = {
      startCheckId: 'unplug',
      cautions: [],
      checks: [
        { id: 'unplug', kind: 'task', title: 'Unplug the sensor', instruction: 'Ignition off, then unplug.', next: 'coil' },
        {
          id: 'coil',
          kind: 'measure',
          title: 'Coil at the sensor',
          instruction: 'Measure across the sensor pins.',
          quantity: 'resistance',
          spec: { kind: 'window', min: 400, max: 500 },
          outcomes: { in_spec: 'at-unit', low: 'f-coil', high: 'f-coil', open: 'f-coil', marginal: 'coil' },
          marginalPolicy: 'branch',
          retest: { maxVisits: 2, whenExhausted: 'at-unit' },
        },
        {
          id: 'at-unit',
          kind: 'measure',
          title: 'Coil at the control unit',
          instruction: 'Measure the same pair at the control-unit connector.',
          quantity: 'resistance',
          spec: { kind: 'agree_with', checkId: 'coil', tolAbs: 5 },
          outcomes: { in_spec: 'f-unit', low: 'f-harness', high: 'f-harness', open: 'f-harness' },
        },
        { id: 'f-coil', kind: 'finding', title: 'Coil', instruction: '', finding: { part: 'Coil', action: 'Replace' } },
        { id: 'f-harness', kind: 'finding', title: 'Harness', instruction: '', finding: { part: 'Harness', action: 'Repair' } },
        { id: 'f-unit', kind: 'finding', title: 'Unit', instruction: '', finding: { part: 'Unit', action: 'Replace' } },
      ],
    };
    expect(validateProcedure(doc)).toEqual([]);
  });

  it('reference_not_dominating: the referenced check comes later', () => {
    expectProblems(
      (d) => {
        (check(d, 'diode-fwd', 'measure').spec = { kind: 'ratio', pairWith: 'diode-rev', minRatio: 10 }),
          (check(d, 'diode-fwd', 'measure').outcomes = { in_spec: 'diode-rev', low: 'f-diode', open: 'f-diode' });
        check(d, 'diode-rev', 'measure').spec = { kind: 'window', min: 0.4, max: 0.8 };
        check(d, 'diode-rev', 'measure').outcomes = { in_spec: 'f-ecu', low: 'f-diode', high: 'f-diode', open: 'f-diode' };
      },
      [{ checkId: 'diode-fwd', code: 'reference_not_dominating' }],
    );
  });
});

describe('validateProcedure: size', () => {
  it('accepts a long chain of measure checks with every outcome (many more edges than checks)', () => {
    const n = 60;
    const checks: Check[] = Array.from({ length: n }, (_, i): Check => {
      const next = i + 1 < n ? `m${i + 1}` : 'end';
      return {
        id: `m${i}`,
        kind: 'measure',
        title: `Measure ${i}`,
        instruction: '',
        quantity: 'resistance',
        spec: { kind: 'window', min: 1, max: 2 },
        marginalPolicy: 'branch',
        outcomes: { in_spec: next, low: 'end', high: 'end', open: 'end', marginal: 'end', no_reading: 'end' },
      };
    });
    checks.push({ id: 'end', kind: 'finding', title: 'End', instruction: '', finding: { part: 'p', action: 'a' } });
    expect(validateProcedure({ startCheckId: 'm0', cautions: [], checks })).toEqual([]);
  });
});

describe('validateProcedure: generated procedures', () => {
  const sizes = fc.integer({ min: 2, max: 300 });
  const seeds = fc.integer({ min: 0, max: 2 ** 31 - 1 });

  it('accepts every well-formed generated procedure, loops included', () => {
    fc.assert(
      fc.property(sizes, seeds, (checks, seed) => {
        expect(validateProcedure(generateProcedure({ checks, seed }))).toEqual([]);
      }),
      { numRuns: 200 },
    );
  }, 60_000);

  it('the generator does produce loops, merges and earlier-reading specs (so the acceptance above means something)', () => {
    const doc = generateProcedure({ checks: 2000, seed: 11 });
    const measures = doc.checks.filter((c): c is MeasureCheck => c.kind === 'measure');
    expect(measures.some((c) => c.retest !== undefined)).toBe(true);
    expect(measures.some((c) => c.spec.kind === 'ratio')).toBe(true);
    expect(measures.some((c) => c.spec.kind === 'agree_with')).toBe(true);
    const incoming = new Map<string, number>();
    for (const c of doc.checks) {
      const targets = c.kind === 'measure' ? Object.values(c.outcomes) : c.kind === 'observe' ? c.choices.map((x) => x.next) : c.kind === 'task' ? [c.next] : [];
      for (const t of targets) incoming.set(t!, (incoming.get(t!) ?? 0) + 1);
    }
    expect(doc.checks.some((c) => c.kind !== 'finding' && (incoming.get(c.id) ?? 0) > 1)).toBe(true);
  });

  /** Every outcome edge of a document, with a setter to redirect it. */
  function edges(doc: ProcedureDocument): { from: string; retarget: (to: string) => void }[] {
    const list: { from: string; retarget: (to: string) => void }[] = [];
    for (const c of doc.checks) {
      if (c.kind === 'measure') for (const key of Object.keys(c.outcomes) as (keyof MeasureCheck['outcomes'])[]) list.push({ from: c.id, retarget: (to) => (c.outcomes[key] = to) });
      if (c.kind === 'observe') for (const choice of c.choices) list.push({ from: c.id, retarget: (to) => (choice.next = to) });
      if (c.kind === 'task') list.push({ from: c.id, retarget: (to) => (c.next = to) });
    }
    return list;
  }

  it('reports every deliberately broken edge as dangling, at the check it leaves from', () => {
    fc.assert(
      fc.property(sizes, seeds, fc.array(fc.nat(), { minLength: 1, maxLength: 8 }), (checks, seed, picks) => {
        const doc = generateProcedure({ checks, seed });
        const all = edges(doc);
        const broken = new Map<number, string>();
        for (const p of picks) broken.set(p % all.length, all[p % all.length].from);
        for (const [k] of broken) all[k].retarget(`missing-${k}`);
        const found = validateProcedure(doc).filter((p) => p.code === 'dangling_outcome');
        expect(found).toHaveLength(broken.size);
        for (const [k, from] of broken) expect(found).toContainEqual(expect.objectContaining({ checkId: from, message: expect.stringContaining(`missing-${k}`) }));
      }),
      { numRuns: 200 },
    );
  }, 60_000);

  it('reports a loop closed on any non-re-test check as a cycle at that check', () => {
    fc.assert(
      fc.property(sizes, seeds, fc.nat(), (checks, seed, pick) => {
        const doc = generateProcedure({ checks, seed, loops: false });
        const all = edges(doc);
        const edge = all[pick % all.length];
        edge.retarget(edge.from);
        expect(validateProcedure(doc).filter((p) => p.code === 'cycle')).toContainEqual(expect.objectContaining({ checkId: edge.from }));
      }),
      { numRuns: 200 },
    );
  }, 60_000);

  it('reports an added check nothing leads to as unreachable', () => {
    fc.assert(
      fc.property(sizes, seeds, (checks, seed) => {
        const doc = generateProcedure({ checks, seed });
        doc.checks.push({ id: 'island', kind: 'finding', title: 'Island', instruction: '', finding: { part: 'p', action: 'a' } });
        expect(problems(doc)).toEqual([{ checkId: 'island', code: 'unreachable' }]);
      }),
      { numRuns: 100 },
    );
  }, 60_000);
});
