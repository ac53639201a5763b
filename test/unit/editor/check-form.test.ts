import { describe, expect, it } from 'vitest';
import { checkFormSchema, checkFromForm, formatExact, formValuesOf, movePicture, newChoiceId } from '@shared/editor/check-form';
import { fixtureProcedure } from '../../support/fixture-procedure';

describe('check form', () => {
  it('round-trips every check of a procedure unchanged', () => {
    for (const check of fixtureProcedure().checks) {
      const values = formValuesOf(check);
      expect(checkFormSchema.isValidSync(values)).toBe(true);
      expect(checkFromForm(values, check)).toEqual(check);
    }
  });

  it('reads spec values with prefixes: "0.4 kΩ" is 400 Ω', () => {
    const coil = fixtureProcedure().checks[0];
    const values = { ...formValuesOf(coil), min: '0.4 kΩ', max: '0,5 k' };
    expect(checkFormSchema.isValidSync(values)).toBe(true);
    const next = checkFromForm(values, coil);
    expect(next.kind === 'measure' && next.spec).toMatchObject({ kind: 'window', min: 400, max: 500, unit: 'Ω' });
  });

  it('refuses a value in another quantity’s unit, with the parser’s message', () => {
    const coil = fixtureProcedure().checks[0];
    expect(() => checkFormSchema.validateSync({ ...formValuesOf(coil), min: '12 V' })).toThrow(/Minimum/);
  });

  it('writes values so that reading them back gives the same number', () => {
    expect(formatExact(12.65, 'voltage_dc')).toBe('12.65 V');
    expect(formatExact(480, 'resistance')).toBe('480 Ω');
    expect(formatExact(0.0005, 'current_dc')).toBe('500 µA');
  });

  describe('observation choices', () => {
    const spark = () => fixtureProcedure().checks.find((c) => c.id === 'spark')!;

    it('renames a choice and keeps where it leads', () => {
      const values = formValuesOf(spark());
      values.choices[1] = { ...values.choices[1], label: 'No flash at all' };
      const next = checkFromForm(values, spark());
      expect(next.kind === 'observe' && next.choices).toEqual([
        { id: 'flash', label: 'Tester flashes', next: 'ok' },
        { id: 'none', label: 'No flash at all', next: 'unplug' },
      ]);
    });

    it('adds a choice with a fresh id leading where the first way out led, and removes one with its outcome', () => {
      const values = formValuesOf(spark());
      const id = newChoiceId(values.choices);
      expect(id).toBe('choice-3');
      const added = checkFromForm({ ...values, choices: [...values.choices, { id, label: 'Weak orange flash' }] }, spark());
      expect(added.kind === 'observe' && added.choices[2]).toEqual({ id: 'choice-3', label: 'Weak orange flash', next: 'ok' });
      const removed = checkFromForm({ ...values, choices: [values.choices[0], { id, label: 'Weak orange flash' }] }, spark());
      expect(removed.kind === 'observe' && removed.choices.map((c) => c.id)).toEqual(['flash', 'choice-3']);
    });

    it('refuses a blank choice, two that say the same, and fewer than two', () => {
      const values = formValuesOf(spark());
      expect(() => checkFormSchema.validateSync({ ...values, choices: [values.choices[0], { id: 'x', label: '  ' }] })).toThrow(/Say what the technician sees/);
      expect(() => checkFormSchema.validateSync({ ...values, choices: [values.choices[0], { id: 'x', label: 'tester FLASHES' }] })).toThrow(/say the same/);
      expect(() => checkFormSchema.validateSync({ ...values, choices: [values.choices[0]] })).toThrow(/at least two/);
      // Other kinds carry no choices and are not asked for any.
      const coil = fixtureProcedure().checks[0];
      expect(checkFormSchema.isValidSync(formValuesOf(coil))).toBe(true);
    });
  });

  describe('pictures', () => {
    const A = { src: '0b6f1d52-8c1e-4f0a-9d3b-2a7c5e4f1a01', alt: 'Connector P1 from the wire side' };
    const B = { src: '0b6f1d52-8c1e-4f0a-9d3b-2a7c5e4f1a02', alt: 'Where P1 sits under the seat' };
    const coil = () => fixtureProcedure().checks[0];

    it('keeps pictures in the order the form lists them, with trimmed descriptions, and drops the field when none are left', () => {
      const withTwo = checkFromForm({ ...formValuesOf(coil()), pictures: [{ ...A, alt: `  ${A.alt} ` }, B] }, coil());
      expect(withTwo.pictures).toEqual([A, B]);
      expect(formValuesOf(withTwo).pictures).toEqual([A, B]);
      const swapped = checkFromForm({ ...formValuesOf(withTwo), pictures: movePicture([A, B], 0, 1) }, withTwo);
      expect(swapped.pictures).toEqual([B, A]);
      const none = checkFromForm({ ...formValuesOf(withTwo), pictures: [] }, withTwo);
      expect('pictures' in none).toBe(false);
    });

    it('moves a picture one place and leaves the ends alone', () => {
      expect(movePicture([A, B], 1, -1)).toEqual([B, A]);
      expect(movePicture([A, B], 0, -1)).toEqual([A, B]);
      expect(movePicture([A, B], 1, 1)).toEqual([A, B]);
    });

    it('asks what a picture shows before it goes into the check', () => {
      expect(() => checkFormSchema.validateSync({ ...formValuesOf(coil()), pictures: [{ ...A, alt: '   ' }] })).toThrow(/Say what the picture shows/);
      expect(checkFormSchema.isValidSync({ ...formValuesOf(coil()), pictures: [A] })).toBe(true);
    });
  });
});
