import { describe, expect, it } from 'vitest';
import { fitToView } from '@shared/editor/viewport';
import { DIAGRAM_FONT, layoutProcedure, LEGIBLE_PX, LEGIBLE_SCALE, NODE_WIDTH, wrapTitle, type DiagramNode, type Point } from '@/lib/procedure-layout';
import { DEMO_PROCEDURES } from '@server/seed/demo-workshop/procedures';
import { demoProcedure } from '../engine/demo-procedure';

const inside = (p: Point, n: DiagramNode, slack = 1) => Math.abs(p.x - n.x) <= n.width / 2 + slack && Math.abs(p.y - n.y) <= n.height / 2 + slack;
const overlap = (a: DiagramNode, b: DiagramNode) => Math.abs(a.x - b.x) < (a.width + b.width) / 2 && Math.abs(a.y - b.y) < (a.height + b.height) / 2;

describe('wrapTitle', () => {
  it('wraps on words within the line length', () => {
    expect(wrapTitle('Crank sensor coil resistance')).toEqual(['Crank sensor coil', 'resistance']);
    expect(wrapTitle('Battery')).toEqual(['Battery']);
  });

  it('keeps at most three lines and says when it cut', () => {
    const lines = wrapTitle('Charging voltage at the battery with the headlight on and the engine at four thousand rpm');
    expect(lines).toHaveLength(3);
    expect(lines[2].endsWith('…')).toBe(true);
    expect(lines.every((l) => l.length <= 21)).toBe(true);
  });

  it('clips a single word longer than a line', () => {
    expect(wrapTitle('Supercalifragilisticexpialidocious')).toEqual(['Supercalifragilistic…']);
  });
});

describe('layoutProcedure', () => {
  const doc = demoProcedure();
  const layout = layoutProcedure(doc);
  const node = (id: string) => layout.nodes.find((n) => n.id === id)!;

  it('places every check once, inside the diagram, without overlaps', () => {
    expect(layout.nodes.map((n) => n.id)).toEqual(doc.checks.map((c) => c.id));
    for (const n of layout.nodes) {
      expect(n.width).toBe(NODE_WIDTH);
      expect(n.x - n.width / 2).toBeGreaterThanOrEqual(0);
      expect(n.y + n.height / 2).toBeLessThanOrEqual(layout.height);
    }
    for (const [i, a] of layout.nodes.entries()) for (const b of layout.nodes.slice(i + 1)) expect(overlap(a, b), `${a.id} overlaps ${b.id}`).toBe(false);
  });

  it('draws one arrow per target, labelled with every outcome that leads there', () => {
    const toFinding = layout.edges.filter((e) => e.from === 'ckp-ohms' && e.to === 'f-ckp');
    expect(toFinding).toHaveLength(1);
    expect(toFinding[0].label).toBe('low · high · open');
    expect(layout.edges.find((e) => e.from === 'spark' && e.to === 'battery')!.label).toBe('No flash');
    expect(layout.edges.find((e) => e.from === 'reseat')!.label).toBe('');
  });

  it('runs each arrow from its check to the next, a loop back included', () => {
    for (const e of layout.edges) {
      expect(e.points.length).toBeGreaterThanOrEqual(2);
      expect(inside(e.points[0], node(e.from)), `${e.from}→${e.to} starts at its check`).toBe(true);
      expect(inside(e.points[e.points.length - 1], node(e.to)), `${e.from}→${e.to} ends at its target`).toBe(true);
    }
    expect(layout.edges.some((e) => e.from === 'reseat' && e.to === 'ckp-ohms')).toBe(true);
  });

  it('puts the first check above the checks it leads to', () => {
    expect(node('spark').y).toBeLessThan(node('battery').y);
    expect(node('battery').y).toBeLessThan(node('ckp-ohms').y);
  });

  it('lays out every demo procedure', () => {
    for (const p of DEMO_PROCEDURES) {
      for (const v of p.versions) {
        const l = layoutProcedure(v.document);
        expect(l.nodes).toHaveLength(v.document.checks.length);
        expect(l.width).toBeGreaterThan(0);
      }
    }
  });
});

describe('legible text at "fit"', () => {
  // The editor's diagram pane at 1440×900: the window less the sidebar (264), the check list (280), the side
  // panel (400) and padding; the header and tools take about 190 px of the height. Measured on the screenshots.
  const pane = { width: 1440 - 264 - 280 - 400 - 26, height: 900 - 190 };

  it('draws the smallest text at 12 px or more on every demo procedure, fitting the width when the whole is too small', () => {
    expect(LEGIBLE_SCALE * Math.min(...Object.values(DIAGRAM_FONT))).toBeCloseTo(LEGIBLE_PX, 10);
    for (const p of DEMO_PROCEDURES) {
      for (const v of p.versions) {
        const layout = layoutProcedure(v.document);
        const fit = fitToView(layout, pane, LEGIBLE_SCALE);
        expect(fit.scale * DIAGRAM_FONT.caption, p.title).toBeGreaterThanOrEqual(LEGIBLE_PX - 1e-9);
        // Whole-diagram fit alone would shrink the large ones below that.
        const whole = fitToView(layout, pane);
        if (v.document.checks.length >= 30) expect(whole.scale * DIAGRAM_FONT.caption, p.title).toBeLessThan(LEGIBLE_PX);
      }
    }
  });
});
