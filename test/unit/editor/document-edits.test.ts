import { describe, expect, it } from 'vitest';
import { addCheck, deleteCheck, setOutcome, targetOf } from '@shared/editor/document-edits';
import { validateProcedure } from '@shared/engine/validate-procedure';
import { fixtureProcedure } from '../../support/fixture-procedure';

describe('document edits', () => {
  it('adds a check on an outcome: the outcome leads to it and it leads where the outcome used to', () => {
    const doc = fixtureProcedure();
    const { document, id } = addCheck(doc, 'task', { checkId: 'spark', choiceId: 'none' });
    expect(targetOf(document, { checkId: 'spark', choiceId: 'none' })).toBe(id);
    expect(targetOf(document, { checkId: id, next: true })).toBe('unplug');
    expect(targetOf(doc, { checkId: 'spark', choiceId: 'none' })).toBe('unplug');
  });

  it('a new measure check is left incomplete so validation says what to fill in', () => {
    const { document, id } = addCheck(fixtureProcedure(), 'measure', { checkId: 'coil', verdict: 'in_spec' });
    const codes = validateProcedure(document).filter((p) => p.checkId === id).map((p) => p.code);
    expect(codes).toContain('missing_outcome');
  });

  it('deleting a check leaves the outcomes that led to it for validation to flag', () => {
    const document = deleteCheck(fixtureProcedure(), 'diode-bad');
    const dangling = validateProcedure(document).filter((p) => p.code === 'dangling_outcome').map((p) => p.checkId);
    expect(new Set(dangling)).toEqual(new Set(['diode-fwd', 'diode-rev']));
  });

  it('deleting the start check moves the start; the last check is never deleted', () => {
    const doc = fixtureProcedure();
    expect(deleteCheck(doc, 'coil').startCheckId).not.toBe('coil');
    const single = { ...doc, checks: [doc.checks[5]], startCheckId: doc.checks[5].id };
    expect(deleteCheck(single, single.startCheckId)).toBe(single);
  });

  it('clears a verdict outcome', () => {
    const document = setOutcome(fixtureProcedure(), { checkId: 'coil', verdict: 'open' }, null);
    expect(targetOf(document, { checkId: 'coil', verdict: 'open' })).toBeUndefined();
  });
});
