import { describe, expect, it } from 'vitest';
import { fitToView, MAX_SCALE, MIN_SCALE, wheelFactor, zoomAt } from '@shared/editor/viewport';

// Zoom about a point: the point's diagram coordinate (p − offset) / scale must not move (common practice, no source).
const diagramPoint = (v: { scale: number; x: number; y: number }, p: { x: number; y: number }) => ({ x: (p.x - v.x) / v.scale, y: (p.y - v.y) / v.scale });

describe('zoom about the pointer', () => {
  it('keeps the diagram point under the pointer where it was', () => {
    const view = { scale: 0.8, x: 40, y: -120 };
    const pointer = { x: 310, y: 95 };
    const zoomed = zoomAt(view, 1.5, pointer);
    expect(zoomed.scale).toBeCloseTo(1.2, 10);
    const before = diagramPoint(view, pointer);
    const after = diagramPoint(zoomed, pointer);
    expect(after.x).toBeCloseTo(before.x, 10);
    expect(after.y).toBeCloseTo(before.y, 10);
    // Worked by hand: x' = 310 − (310 − 40)·1.5 = −95; y' = 95 − (95 + 120)·1.5 = −227.5.
    expect(zoomed.x).toBeCloseTo(-95, 10);
    expect(zoomed.y).toBeCloseTo(-227.5, 10);
  });

  it('stops at the scale limits without drifting', () => {
    const atMax = { scale: MAX_SCALE, x: 10, y: 20 };
    expect(zoomAt(atMax, 2, { x: 300, y: 300 })).toEqual(atMax);
    expect(zoomAt({ scale: MIN_SCALE, x: 0, y: 0 }, 0.1, { x: 50, y: 50 }).scale).toBe(MIN_SCALE);
  });

  it('turns one wheel notch (deltaY 100) into one 1.25× step, down zooming out', () => {
    expect(wheelFactor(-100)).toBeCloseTo(1.25, 10);
    expect(wheelFactor(100)).toBeCloseTo(0.8, 10);
    expect(wheelFactor(0)).toBe(1);
    expect(wheelFactor(-50) * wheelFactor(-50)).toBeCloseTo(1.25, 10);
  });
});

describe('fit that stays legible', () => {
  const pane = { width: 800, height: 600 };

  it('fits the whole diagram when that is at least the legible scale', () => {
    expect(fitToView({ width: 900, height: 500 }, pane, 0.8)).toEqual({ scale: 800 / 900, x: 0, y: (600 - 500 * (800 / 900)) / 2 });
  });

  it('falls back to the pane width, from the top, for a tall diagram', () => {
    // Whole: min(800/760, 600/2400) = 0.25 < 0.8; across: min(1, 800/760) = 1.
    expect(fitToView({ width: 760, height: 2400 }, pane, 0.8)).toEqual({ scale: 1, x: 20, y: 0 });
  });

  it('shows a diagram too wide even for that at the legible scale, from the top left', () => {
    expect(fitToView({ width: 2000, height: 3000 }, pane, 0.8)).toEqual({ scale: 0.8, x: 0, y: 0 });
  });

  it('centres a too-wide diagram across on the start check, within the drawing', () => {
    // 800/2 − 1000·0.8 = −400; the edge limits are 800 − 2000·0.8 = −800 and 0.
    expect(fitToView({ width: 2000, height: 3000 }, pane, 0.8, { x: 1000 })).toEqual({ scale: 0.8, x: -400, y: 0 });
    expect(fitToView({ width: 2000, height: 3000 }, pane, 0.8, { x: 100 }).x).toBe(0);
    expect(fitToView({ width: 2000, height: 3000 }, pane, 0.8, { x: 1990 }).x).toBe(-800);
  });

  it('without a legible floor fits the whole as before', () => {
    expect(fitToView({ width: 2000, height: 3000 }, pane).scale).toBeCloseTo(0.25, 10);
  });
});
