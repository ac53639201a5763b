import { describe, expect, it } from 'vitest';
import { checkFormSchema, checkFromForm, formatExact, formValuesOf } from '@shared/editor/check-form';
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
});
