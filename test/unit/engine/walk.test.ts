import { describe, expect, it } from 'vitest';
import type { MeasureCheck, ProcedureDocument } from '@shared/engine/procedure';
import { nextCheckId } from '@shared/engine/walk';
import { demoProcedure } from './demo-procedure';

function measure(doc: ProcedureDocument, id: string): MeasureCheck {
  const check = doc.checks.find((c) => c.id === id);
  if (check?.kind !== 'measure') throw new Error(`${id} is not a measure check`);
  return check;
}

describe('nextCheckId', () => {
  const doc = demoProcedure();

  it('follows an observation choice', () => {
    expect(nextCheckId(doc, 'spark', { choiceId: 'none' })).toEqual({ ok: true, next: 'battery', via: 'none', exhausted: null });
    expect(nextCheckId(doc, 'spark', { choiceId: 'flash' })).toMatchObject({ next: 'f-fuel' });
  });

  it('follows the outcome of a verdict', () => {
    expect(nextCheckId(doc, 'battery', { verdict: 'in_spec' })).toMatchObject({ ok: true, next: 'ckp-ohms', via: 'in_spec' });
    expect(nextCheckId(doc, 'battery', { verdict: 'low' })).toMatchObject({ next: 'f-battery' });
    expect(nextCheckId(doc, 'ckp-ohms', { verdict: 'open' })).toMatchObject({ next: 'f-ckp' });
  });

  it('follows a task’s next step once it is done', () => {
    expect(nextCheckId(doc, 'reseat', { done: true })).toMatchObject({ ok: true, next: 'ckp-ohms', via: 'next' });
  });

  it('ends at a finding', () => {
    expect(nextCheckId(doc, 'f-ckp', { done: true })).toEqual({ ok: true, next: null, via: 'finding', exhausted: null });
  });

  describe('marginal readings', () => {
    it('branch: takes the check’s own marginal outcome', () => {
      expect(nextCheckId(doc, 'ckp-ohms', { verdict: 'marginal', leans: 'high' })).toMatchObject({ next: 'reseat', via: 'marginal' });
    });

    it('pass: takes the in-spec outcome', () => {
      const d = demoProcedure();
      measure(d, 'diode-fwd').marginalPolicy = 'pass';
      expect(nextCheckId(d, 'diode-fwd', { verdict: 'marginal', leans: 'low' })).toMatchObject({ next: 'diode-rev', via: 'in_spec' });
    });

    it('fail: takes the side it leans to (the procedure’s default here)', () => {
      expect(nextCheckId(doc, 'diode-fwd', { verdict: 'marginal', leans: 'low' })).toMatchObject({ next: 'f-diode', via: 'low' });
      expect(nextCheckId(doc, 'battery', { verdict: 'marginal', leans: 'low' })).toMatchObject({ next: 'f-battery', via: 'low' });
    });

    it('defaults to fail when neither check nor procedure says', () => {
      const d = demoProcedure();
      delete d.marginalPolicy;
      expect(nextCheckId(d, 'battery', { verdict: 'marginal', leans: 'high' })).toMatchObject({ ok: false });
      expect(nextCheckId(d, 'battery', { verdict: 'marginal', leans: 'low' })).toMatchObject({ next: 'f-battery' });
    });

    it('fail without a lean is refused', () => {
      expect(nextCheckId(doc, 'battery', { verdict: 'marginal' })).toMatchObject({ ok: false, message: expect.stringMatching(/leans/) });
    });
  });

  describe('re-test loops', () => {
    it('re-enters the re-test check while visits remain', () => {
      const visits = (id: string) => (id === 'ckp-ohms' ? 1 : 0);
      expect(nextCheckId(doc, 'reseat', { done: true }, visits)).toMatchObject({ next: 'ckp-ohms', exhausted: null });
    });

    it('goes to “when exhausted” once the visit limit is used up', () => {
      const visits = (id: string) => (id === 'ckp-ohms' ? 2 : 0);
      expect(nextCheckId(doc, 'reseat', { done: true }, visits)).toEqual({ ok: true, next: 'f-ckp', via: 'next', exhausted: 'ckp-ohms' });
    });
  });

  describe('refusals', () => {
    it('refuses an unknown check', () => {
      expect(nextCheckId(doc, 'nope', { done: true })).toMatchObject({ ok: false, message: expect.stringMatching(/no check “nope”/) });
    });

    it('refuses the wrong kind of step for the check', () => {
      expect(nextCheckId(doc, 'battery', { done: true }).ok).toBe(false);
      expect(nextCheckId(doc, 'spark', { verdict: 'in_spec' }).ok).toBe(false);
      expect(nextCheckId(doc, 'reseat', { choiceId: 'flash' }).ok).toBe(false);
    });

    it('refuses a choice the observation doesn’t offer', () => {
      expect(nextCheckId(doc, 'spark', { choiceId: 'smoke' })).toMatchObject({ ok: false });
    });

    it('refuses a verdict with no outcome, naming no_reading plainly', () => {
      expect(nextCheckId(doc, 'battery', { verdict: 'high' })).toMatchObject({ ok: false, message: expect.stringMatching(/no outcome for high/) });
      expect(nextCheckId(doc, 'battery', { verdict: 'no_reading' })).toMatchObject({ ok: false, message: expect.stringMatching(/needs a reading/) });
    });

    it('refuses an outcome that leads to a missing check', () => {
      const d = demoProcedure();
      measure(d, 'battery').outcomes.in_spec = 'gone';
      expect(nextCheckId(d, 'battery', { verdict: 'in_spec' })).toMatchObject({ ok: false, message: expect.stringMatching(/missing check “gone”/) });
    });
  });
});
