import { describe, expect, it } from 'vitest';
import { evaluate } from '@shared/engine/evaluate';
import type { MeasureCheck } from '@shared/engine/procedure';
import { practiceQuestions, scorePracticeAnswer, type PracticeStep } from '@shared/practice/questions';
import { demoProcedure } from '../engine/demo-procedure';

/** Practice questions and scoring on the invented demo procedure; the right answers are the recorded step's. */
const doc = demoProcedure();
const measure = (id: string) => doc.checks.find((c) => c.id === id) as MeasureCheck;

function measured(checkId: string, value: number, nextCheckId: string, retracted = false): PracticeStep {
  const check = measure(checkId);
  const evaluation = evaluate(check.spec, { value, overRange: false, quantity: check.quantity }, { accuracy: { pctOfReading: 1, counts: 2, resolution: 0.01 } });
  return { checkId, verdict: evaluation.verdict, evaluation, choiceId: null, nextCheckId, retracted };
}

describe('practiceQuestions', () => {
  it('asks a measure step for its verdict, offering the verdicts the check can give, then for the next check', () => {
    const step = measured('battery', 12.1, 'f-battery');
    const [verdict, next] = practiceQuestions(doc, step);
    expect(verdict).toMatchObject({ asked: 'verdict', expected: 'low' });
    expect(verdict.choices).toEqual([
      { value: 'in_spec', label: 'In spec' },
      { value: 'low', label: 'Low' },
      { value: 'marginal', label: 'Marginal' },
    ]);
    expect(next).toMatchObject({ asked: 'next_check', expected: 'f-battery' });
    expect(next.choices).toEqual([
      { value: 'ckp-ohms', label: 'Crank sensor coil resistance' },
      { value: 'f-battery', label: 'Battery' },
    ]);
  });

  it('offers open circuit where over range means open (resistance)', () => {
    const values = practiceQuestions(doc, measured('ckp-ohms', 450, 'ckp-ecu'))[0].choices.map((c) => c.value);
    expect(values).toEqual(['in_spec', 'low', 'high', 'open', 'marginal']);
  });

  it('asks an observation step only which check comes next', () => {
    const questions = practiceQuestions(doc, { checkId: 'spark', verdict: null, evaluation: null, choiceId: 'none', nextCheckId: 'battery', retracted: false });
    expect(questions.map((q) => q.asked)).toEqual(['next_check']);
    expect(questions[0].choices.map((c) => c.value)).toEqual(['f-fuel', 'battery']);
  });

  it('asks nothing of a task with one way on, and only the verdict of a retracted reading', () => {
    expect(practiceQuestions(doc, { checkId: 'reseat', verdict: null, evaluation: null, choiceId: null, nextCheckId: 'ckp-ohms', retracted: false })).toEqual([]);
    expect(practiceQuestions(doc, measured('battery', 12.1, 'f-battery', true)).map((q) => q.asked)).toEqual(['verdict']);
  });
});

describe('scorePracticeAnswer', () => {
  it('scores against the recorded verdict and explains it with the engine’s words', () => {
    const step = measured('battery', 12.1, 'f-battery');
    const wrong = scorePracticeAnswer(doc, step, 'verdict', 'in_spec');
    expect(wrong).toMatchObject({ ok: true, correct: false, expected: 'low', expectedLabel: 'Low' });
    expect(wrong.ok && wrong.explanation).toMatch(/^12\.1 V is below the minimum of 12\.4 V/);
    expect(scorePracticeAnswer(doc, step, 'verdict', 'low')).toMatchObject({ ok: true, correct: true });
  });

  it('explains the way on from an observation', () => {
    const step: PracticeStep = { checkId: 'spark', verdict: null, evaluation: null, choiceId: 'none', nextCheckId: 'battery', retracted: false };
    expect(scorePracticeAnswer(doc, step, 'next_check', 'battery')).toMatchObject({
      ok: true,
      correct: true,
      explanation: '“No flash” leads to “Battery voltage, rested”.',
    });
  });

  it('explains a marginal reading folded to the side it leans to (the procedure’s “fail” policy)', () => {
    // 12.41 V ± (1 % of 12.41 V + 2 counts of 0.01 V) = 12.41 ± 0.144 V straddles the 12.4 V minimum: marginal,
    // leaning low, which guarded acceptance treats as low.
    const step = measured('battery', 12.41, 'f-battery');
    expect(step.verdict).toBe('marginal');
    const score = scorePracticeAnswer(doc, step, 'next_check', 'ckp-ohms');
    expect(score).toMatchObject({ ok: true, correct: false, expected: 'f-battery' });
    expect(score.ok && score.explanation).toBe('A marginal reading, treated as low, leads to “Battery”.');
  });

  it('explains a re-test whose visits are used up', () => {
    const step: PracticeStep = { checkId: 'reseat', verdict: null, evaluation: null, choiceId: null, nextCheckId: 'f-ckp', retracted: false };
    const score = scorePracticeAnswer(doc, step, 'next_check', 'ckp-ohms');
    expect(score).toMatchObject({ ok: true, correct: false, expected: 'f-ckp' });
    expect(score.ok && score.explanation).toBe(
      'Once the task is done, it leads to “Crank sensor coil resistance”, which had already run 2 times, so the procedure goes on to “Crank position sensor”.',
    );
  });

  it('refuses an answer that is not a choice, and a question the step does not ask', () => {
    const step = measured('battery', 12.1, 'f-battery');
    expect(scorePracticeAnswer(doc, step, 'verdict', 'sideways')).toMatchObject({ ok: false, status: 400, code: 'not_a_choice' });
    const spark: PracticeStep = { checkId: 'spark', verdict: null, evaluation: null, choiceId: 'none', nextCheckId: 'battery', retracted: false };
    expect(scorePracticeAnswer(doc, spark, 'verdict', 'in_spec')).toMatchObject({ ok: false, status: 409, code: 'no_such_question' });
  });
});
