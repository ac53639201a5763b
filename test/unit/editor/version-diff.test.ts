import { describe, expect, it } from 'vitest';
import { diffVersions, isUnchanged } from '@shared/editor/version-diff';
import { fixtureProcedure } from '../../support/fixture-procedure';

describe('version comparison', () => {
  it('finds nothing between a version and itself', () => {
    expect(isUnchanged(diffVersions(fixtureProcedure(), fixtureProcedure()))).toBe(true);
  });

  it('lists added and removed checks, changed fields and re-pointed outcomes', () => {
    const before = fixtureProcedure();
    const after = fixtureProcedure();
    const coil = after.checks[0];
    if (coil.kind !== 'measure' || coil.spec.kind !== 'window') throw new Error('fixture changed');
    coil.spec.max = 520;
    coil.outcomes.high = 'ok';
    after.checks = after.checks.filter((c) => c.id !== 'coil-shorted');
    after.checks.push({ id: 'wiggle', kind: 'task', title: 'Wiggle the harness', instruction: '', next: 'ok' });
    const d = diffVersions(before, after);
    expect(d.added.map((c) => c.id)).toEqual(['wiggle']);
    expect(d.removed.map((c) => c.id)).toEqual(['coil-shorted']);
    expect(d.changed).toEqual([{ id: 'coil', title: 'Pickup coil resistance', fields: [{ field: 'spec.max', before: '500', after: '520' }] }]);
    expect(d.repointed).toEqual([{ checkId: 'coil', outcome: 'high', before: 'coil-open', after: 'ok' }]);
  });

  it('reports a changed choice label as a field and a changed start as a procedure change', () => {
    const after = fixtureProcedure();
    const spark = after.checks[1];
    if (spark.kind !== 'observe') throw new Error('fixture changed');
    spark.choices[0].label = 'Blue spark';
    after.startCheckId = 'spark';
    const d = diffVersions(fixtureProcedure(), after);
    expect(d.changed[0].fields).toEqual([{ field: 'choices.flash', before: 'Tester flashes', after: 'Blue spark' }]);
    expect(d.procedure).toEqual([{ field: 'startCheckId', before: 'coil', after: 'spark' }]);
  });
});
