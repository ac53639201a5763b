/** Zoom of the procedure diagram: fit to the pane, step in and out, and keep within sensible bounds. */
export interface Viewport {
  scale: number;
  /** Offset of the diagram's origin in the pane, in pane pixels. */
  x: number;
  y: number;
}

export const MIN_SCALE = 0.25;
export const MAX_SCALE = 2;
const STEP = 1.25;

const clampScale = (s: number) => Math.min(MAX_SCALE, Math.max(MIN_SCALE, s));

/**
 * The whole diagram in the pane, centred, never enlarged past 1:1. With `legible`, never shrunk below that scale
 * either: a diagram too big to fit at it is fitted to the pane's width instead (or shown at `legible` when even
 * that is too small) from its top, where the start check is, and the rest is panned to. A diagram still wider
 * than the pane is centred across on `focus` (the start check), kept within the drawing's edges.
 */
export function fitToView(
  diagram: { width: number; height: number },
  pane: { width: number; height: number },
  legible = MIN_SCALE,
  focus?: { x: number },
): Viewport {
  const across = pane.width / Math.max(diagram.width, 1);
  const whole = clampScale(Math.min(1, across, pane.height / Math.max(diagram.height, 1)));
  const scale = whole >= legible ? whole : clampScale(Math.max(legible, Math.min(1, across)));
  const centred = (room: number, size: number) => Math.max(0, (room - size * scale) / 2);
  const overflow = pane.width - diagram.width * scale;
  const x = overflow >= 0 || !focus ? centred(pane.width, diagram.width) : Math.min(0, Math.max(overflow, pane.width / 2 - focus.x * scale));
  return { scale, x, y: scale === whole ? centred(pane.height, diagram.height) : 0 };
}

/** Zoom by `factor` about a point of the pane (the pointer), so what is under it stays there. */
export function zoomAt(view: Viewport, factor: number, point: { x: number; y: number }): Viewport {
  const scale = clampScale(view.scale * factor);
  const k = scale / view.scale;
  return { scale, x: point.x - (point.x - view.x) * k, y: point.y - (point.y - view.y) * k };
}

/** Zoom in (+1) or out (-1) one step about the pane's centre, so what is in the middle stays there. */
export function zoomBy(view: Viewport, direction: 1 | -1, pane: { width: number; height: number }): Viewport {
  return zoomAt(view, direction === 1 ? STEP : 1 / STEP, { x: pane.width / 2, y: pane.height / 2 });
}

/** How much one scroll-wheel event zooms: a notch of a mouse wheel (about 100 px of deltaY) is one 1.25× step. */
export function wheelFactor(deltaY: number): number {
  return Math.pow(STEP, -deltaY / 100);
}

/** Move the view so a node's centre sits in the middle of the pane. */
export function centreOn(view: Viewport, point: { x: number; y: number }, pane: { width: number; height: number }): Viewport {
  return { scale: view.scale, x: pane.width / 2 - point.x * view.scale, y: pane.height / 2 - point.y * view.scale };
}

/**
 * Two diagrams to show at once (a comparison): beside each other or one above the other, whichever lets
 * the smaller of the two fitted scales be larger. `gap` is the space between the panes and `chrome` what
 * each pane spends on its own heading and zoom tools above the drawing.
 */
export function bestArrangement(
  diagrams: readonly [{ width: number; height: number }, { width: number; height: number }],
  area: { width: number; height: number },
  gap: number,
  chrome: number,
): 'row' | 'column' {
  const smallerScale = (pane: { width: number; height: number }) => Math.min(...diagrams.map((d) => fitToView(d, pane).scale));
  const row = smallerScale({ width: (area.width - gap) / 2, height: area.height - chrome });
  const column = smallerScale({ width: area.width, height: (area.height - gap) / 2 - chrome });
  return column > row ? 'column' : 'row';
}
