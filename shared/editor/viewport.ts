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

/** The whole diagram in the pane, centred, never enlarged past 1:1. */
export function fitToView(diagram: { width: number; height: number }, pane: { width: number; height: number }): Viewport {
  const scale = clampScale(Math.min(1, pane.width / Math.max(diagram.width, 1), pane.height / Math.max(diagram.height, 1)));
  return { scale, x: Math.max(0, (pane.width - diagram.width * scale) / 2), y: Math.max(0, (pane.height - diagram.height * scale) / 2) };
}

/** Zoom in (+1) or out (-1) about the pane's centre, so what is in the middle stays there. */
export function zoomBy(view: Viewport, direction: 1 | -1, pane: { width: number; height: number }): Viewport {
  const scale = clampScale(direction === 1 ? view.scale * STEP : view.scale / STEP);
  const k = scale / view.scale;
  const cx = pane.width / 2;
  const cy = pane.height / 2;
  return { scale, x: cx - (cx - view.x) * k, y: cy - (cy - view.y) * k };
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
