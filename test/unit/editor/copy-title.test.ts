import { describe, expect, it } from 'vitest';
import { copyTitle } from '@shared/procedures/copy-title';

// Titling rules of our own (common practice for "duplicate" in editors, no source).
describe('copyTitle', () => {
  it('adds "(copy)", then numbers copies whose title is taken', () => {
    expect(copyTitle('No spark', ['No spark'])).toBe('No spark (copy)');
    expect(copyTitle('No spark', ['No spark', 'No spark (copy)'])).toBe('No spark (copy 2)');
    expect(copyTitle('No spark', ['No spark (copy)', 'No spark (copy 2)'])).toBe('No spark (copy 3)');
  });

  it('numbers a copy of a copy from the original title instead of stacking suffixes', () => {
    expect(copyTitle('No spark (copy)', ['No spark', 'No spark (copy)'])).toBe('No spark (copy 2)');
    expect(copyTitle('No spark (copy 2)', ['No spark (copy)', 'No spark (copy 2)'])).toBe('No spark (copy 3)');
  });

  it('keeps a long title within the 120-character limit', () => {
    const long = 'x'.repeat(120);
    expect(copyTitle(long, [long])).toHaveLength(120);
    expect(copyTitle(long, [long]).endsWith(' (copy)')).toBe(true);
    expect(copyTitle(long, [copyTitle(long, [])])).toMatch(/ \(copy 2\)$/);
    expect(copyTitle(long, [copyTitle(long, [])])).toHaveLength(120);
  });
});
