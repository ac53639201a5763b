import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { IdIndex } from '@shared/engine/id-index';

describe('IdIndex', () => {
  it('finds every id it was given and nothing else, like a Map', () => {
    fc.assert(
      fc.property(fc.array(fc.string({ maxLength: 6 }), { maxLength: 300 }), fc.array(fc.string({ maxLength: 6 }), { maxLength: 50 }), (ids, probes) => {
        const index = new IdIndex(ids.length);
        const reference = new Map<string, number>();
        ids.forEach((id, i) => {
          expect(index.add(id, i)).toBe(reference.get(id) ?? -1);
          if (!reference.has(id)) reference.set(id, i);
        });
        for (const id of [...ids, ...probes]) expect(index.get(id)).toBe(reference.get(id) ?? -1);
      }),
    );
  });

  it('grows its character pool for long ids', () => {
    const ids = Array.from({ length: 5 }, (_, i) => `${'x'.repeat(40)}-${i}`);
    const index = new IdIndex(ids.length);
    ids.forEach((id, i) => expect(index.add(id, i)).toBe(-1));
    ids.forEach((id, i) => expect(index.get(id)).toBe(i));
    expect(index.get('x'.repeat(40))).toBe(-1);
  });

  it('copes with an empty list', () => {
    expect(new IdIndex(0).get('c1')).toBe(-1);
  });
});
