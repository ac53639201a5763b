import { describe, expect, it } from 'vitest';
import { previewStep, type PreviewStep } from '@shared/editor/preview';
import { bestArrangement, fitToView, MAX_SCALE, zoomBy } from '@shared/editor/viewport';
import { fixtureProcedure } from '../../support/fixture-procedure';

describe('diagram viewport', () => {
  it('fits a large diagram into the pane and never enlarges a small one', () => {
    expect(fitToView({ width: 2000, height: 1000 }, { width: 1000, height: 800 }).scale).toBe(0.5);
    expect(fitToView({ width: 200, height: 100 }, { width: 1000, height: 800 })).toEqual({ scale: 1, x: 400, y: 350 });
  });

  it('zooms about the centre of the pane and stops at the limit', () => {
    const pane = { width: 1000, height: 800 };
    const view = zoomBy({ scale: 1, x: 0, y: 0 }, 1, pane);
    expect(view.scale).toBe(1.25);
    expect(view.x).toBeCloseTo(500 - 500 * 1.25);
    let v = view;
    for (let i = 0; i < 20; i++) v = zoomBy(v, 1, pane);
    expect(v.scale).toBe(MAX_SCALE);
  });
});

describe('two diagrams compared', () => {
  const area = { width: 1000, height: 800 };

  it('sets wide diagrams one above the other, where each can be drawn larger', () => {
    const wide = { width: 900, height: 300 };
    expect(bestArrangement([wide, wide], area, 16, 60)).toBe('column');
  });

  it('sets tall diagrams beside each other', () => {
    const tall = { width: 300, height: 900 };
    expect(bestArrangement([tall, { width: 250, height: 700 }], area, 16, 60)).toBe('row');
  });
});

describe('preview', () => {
  it('judges typed readings as a diagnosis would and walks on', () => {
    const doc = fixtureProcedure();
    const first = previewStep(doc, [], 'coil', { reading: '0.45 kΩ' });
    expect(first).toMatchObject({ ok: true, verdict: 'in_spec', nextCheckId: 'spark' });
    const steps: PreviewStep[] = first.ok ? [{ checkId: 'coil', typed: '0.45 kΩ', decision: first }] : [];
    expect(previewStep(doc, steps, 'spark', { choiceId: 'none' })).toMatchObject({ ok: true, nextCheckId: 'unplug' });
    expect(previewStep(doc, [], 'coil', { reading: 'OL' })).toMatchObject({ ok: true, verdict: 'open', nextCheckId: 'coil-open' });
    expect(previewStep(doc, [], 'coil', { reading: 'twelve' })).toMatchObject({ ok: false, field: 'reading' });
  });
});
