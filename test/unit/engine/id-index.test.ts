import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { IdIndex } from '@shared/engine/id-index';

describe('IdIndex', () => {
  it('finds every id it was given and nothing else, like a Map', () => {
    fc.assert(
      fc.property(fc.array(fc.string({ maxLength: 6 }), { maxLength: 300 }), fc.array(fc.string({ maxLength: 6 }), { maxLength: 50 }), (ids, probes) => {
        const index = new IdIndex(ids.length, (i) => ids[i]);
        const reference = new Map<string, number>();
        ids.forEach((id, i) => {
          expect(index.add(i)).toBe(reference.get(id) ?? -1);
          if (!reference.has(id)) reference.set(id, i);
        });
        for (const id of [...ids, ...probes]) expect(index.get(id)).toBe(reference.get(id) ?? -1);
      }),
    );
  });

  it('copes with an empty list', () => {
    expect(new IdIndex(0, () => '').get('c1')).toBe(-1);
  });
});
