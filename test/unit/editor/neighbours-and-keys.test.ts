import { describe, expect, it } from 'vitest';
import { neighbour } from '@shared/editor/neighbours';
import { keyOf } from '@/features/procedures/editor-keys';
import { demoProcedure } from '../engine/demo-procedure';

// Keyboard moves of our own editor (common practice for tree navigation, no source).
describe('neighbour', () => {
  const doc = demoProcedure();

  it('goes down the first outcome and back up to the check that leads here', () => {
    expect(neighbour(doc, 'spark', 'down')).toBe('f-fuel');
    expect(neighbour(doc, 'battery', 'down')).toBe('ckp-ohms');
    expect(neighbour(doc, 'ckp-ohms', 'up')).toBe('battery');
    expect(neighbour(doc, 'spark', 'up')).toBeNull();
  });

  it('steps left and right among the checks one parent leads to, each target once', () => {
    // ckp-ohms leads to ckp-ecu (in spec), f-ckp (low, high, open) and reseat (marginal).
    expect(neighbour(doc, 'ckp-ecu', 'right')).toBe('f-ckp');
    expect(neighbour(doc, 'f-ckp', 'right')).toBe('reseat');
    expect(neighbour(doc, 'reseat', 'right')).toBeNull();
    expect(neighbour(doc, 'f-ckp', 'left')).toBe('ckp-ecu');
    expect(neighbour(doc, 'spark', 'left')).toBeNull();
  });

  it('stops at a finding and ignores a re-test loop back to itself', () => {
    expect(neighbour(doc, 'f-ckp', 'down')).toBeNull();
    // reseat loops back to ckp-ohms: down follows it, and ckp-ohms's parent stays battery (first in document order).
    expect(neighbour(doc, 'reseat', 'down')).toBe('ckp-ohms');
    expect(neighbour(doc, 'reseat', 'up')).toBe('ckp-ohms');
  });
});

describe('keyOf', () => {
  const press = (key: string, mods: Partial<{ ctrlKey: boolean; metaKey: boolean; shiftKey: boolean; altKey: boolean }> = {}) =>
    keyOf({ key, ctrlKey: false, metaKey: false, shiftKey: false, altKey: false, ...mods });

  it('reads undo and redo with Ctrl or ⌘', () => {
    expect(press('z', { ctrlKey: true })).toBe('undo');
    expect(press('Z', { metaKey: true, shiftKey: true })).toBe('redo');
    expect(press('y', { ctrlKey: true })).toBe('redo');
    expect(press('z')).toBeNull();
  });

  it('reads zoom, fit, moves and delete without modifiers, and leaves browser shortcuts alone', () => {
    expect(press('+', { shiftKey: true })).toBe('zoomIn');
    expect(press('=')).toBe('zoomIn');
    expect(press('-')).toBe('zoomOut');
    expect(press('0')).toBe('fit');
    expect(press('ArrowDown')).toBe('down');
    expect(press('Delete')).toBe('delete');
    expect(press('Backspace')).toBe('delete');
    expect(press('0', { ctrlKey: true })).toBeNull();
    expect(press('ArrowLeft', { altKey: true })).toBeNull();
  });
});
