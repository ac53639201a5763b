import { describe, expect, it } from 'vitest';
import { stepKeyOf } from '@/features/replays/step-keys';

const press = (key: string, mods: Partial<{ ctrlKey: boolean; metaKey: boolean; shiftKey: boolean; altKey: boolean }> = {}) => ({
  key,
  ctrlKey: false,
  metaKey: false,
  shiftKey: false,
  altKey: false,
  ...mods,
});
const still = { scrollsSideways: false };

describe('replay step keys', () => {
  it('names the four plain keys', () => {
    expect(stepKeyOf(press('ArrowLeft'), still)).toBe('previous');
    expect(stepKeyOf(press('ArrowRight'), still)).toBe('next');
    expect(stepKeyOf(press('Home'), still)).toBe('first');
    expect(stepKeyOf(press('End'), still)).toBe('finding');
    expect(stepKeyOf(press('ArrowUp'), still)).toBeNull();
    expect(stepKeyOf(press('a'), still)).toBeNull();
  });

  it('leaves combinations to the browser (e.g. Alt+← goes back a page)', () => {
    for (const mod of ['ctrlKey', 'metaKey', 'shiftKey', 'altKey'] as const) expect(stepKeyOf(press('ArrowLeft', { [mod]: true }), still)).toBeNull();
  });

  it('leaves ← and → to a focused area that scrolls sideways, but not Home and End', () => {
    const diagram = { scrollsSideways: true };
    expect(stepKeyOf(press('ArrowLeft'), diagram)).toBeNull();
    expect(stepKeyOf(press('ArrowRight'), diagram)).toBeNull();
    expect(stepKeyOf(press('Home'), diagram)).toBe('first');
  });
});
