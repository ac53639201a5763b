import { describe, expect, it } from 'vitest';
import { pathSoFar } from '@shared/diagnosis/path-so-far';

describe('pathSoFar', () => {
  it('keeps the live steps in order with their readings and the uncertainty of their evaluation', () => {
    const path = pathSoFar([
      { checkId: 'battery', valueSi: 12.6, overRange: false, retracted: false, evaluation: { uncertainty: 0.08 } },
      { checkId: 'stator', valueSi: 4.1, overRange: false, retracted: true, evaluation: { uncertainty: 0.05 } },
      { checkId: 'stator', valueSi: 0.41, overRange: false, retracted: false, evaluation: { uncertainty: 0.02 } },
      { checkId: 'ground', valueSi: null, overRange: true, retracted: false, evaluation: { uncertainty: 0 } },
      { checkId: 'look', valueSi: null, overRange: false, retracted: false, evaluation: null },
    ]);
    expect(path).toEqual([
      { checkId: 'battery', value: 12.6, overRange: false, uncertainty: 0.08 },
      { checkId: 'stator', value: 0.41, overRange: false, uncertainty: 0.02 },
      { checkId: 'ground', value: null, overRange: true, uncertainty: 0 },
      { checkId: 'look', value: null, overRange: false, uncertainty: undefined },
    ]);
  });

  it('is empty when every step was taken back', () => {
    expect(pathSoFar([{ checkId: 'battery', valueSi: 1.2, overRange: false, retracted: true, evaluation: { uncertainty: 0.01 } }])).toEqual([]);
  });
});
