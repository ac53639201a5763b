import dagre from '@dagrejs/dagre';
import type { Check, CheckKind, ProcedureDocument } from '@shared/engine/procedure';
import type { Verdict } from '@shared/engine/verdict';

/**
 * Where each check and outcome arrow of a procedure sits in its diagram, computed by dagre. Pure: the
 * diagram component only draws what this returns. Coordinates are in diagram units with the origin at the
 * top left; a node's x/y is its centre.
 */

export interface Point {
  x: number;
  y: number;
}

export interface DiagramNode {
  id: string;
  kind: CheckKind;
  /** The title, wrapped to fit the node. */
  lines: string[];
  x: number;
  y: number;
  width: number;
  height: number;
}

export interface DiagramEdge {
  from: string;
  to: string;
  /** The outcomes that take this arrow: verdict words or observation labels. */
  label: string;
  points: Point[];
  /** Centre of the label. */
  labelAt: Point | null;
}

export interface ProcedureLayout {
  /** The check a diagnosis starts at. */
  startId: string;
  width: number;
  height: number;
  nodes: DiagramNode[];
  edges: DiagramEdge[];
}

/** Type sizes on the diagram, in diagram units (1 unit = 1 px at 100 %). */
export const DIAGRAM_FONT = { caption: 13, title: 15, label: 13 } as const;
/** The smallest text anyone should have to read on a screen, in px. */
export const LEGIBLE_PX = 12;
/** The zoom at which the smallest text of the diagram is drawn at LEGIBLE_PX: "fit" never goes below it. */
export const LEGIBLE_SCALE = LEGIBLE_PX / Math.min(...Object.values(DIAGRAM_FONT));

export const NODE_WIDTH = 196;
export const LINE_HEIGHT = 19;
/** The kind word line at the top of a node ("MEASURE · start"). */
export const CAPTION_HEIGHT = 18;
export const NODE_PADDING = 12;
const CHARS_PER_LINE = 21;
const MAX_LINES = 3;
const LABEL_CHARS = 24;
/** Rough width of one character of the label font, to reserve room for labels on the arrows. */
export const LABEL_CHAR_WIDTH = 7.2;

/** Verdicts as short arrow labels. */
const ARROW_WORDS: Record<Verdict, string> = { in_spec: 'in spec', low: 'low', high: 'high', open: 'open', marginal: 'marginal', no_reading: 'no reading' };

/** Greedy word wrap into at most `maxLines` lines; the last line ends in … when text is left over. */
export function wrapTitle(title: string, perLine = CHARS_PER_LINE, maxLines = MAX_LINES): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of title.split(/\s+/).filter(Boolean)) {
    const candidate = line ? `${line} ${word}` : word;
    if (candidate.length <= perLine || !line) {
      line = candidate;
      continue;
    }
    lines.push(line);
    line = word;
  }
  if (line) lines.push(line);
  if (lines.length <= maxLines) return lines.map((l) => clip(l, perLine));
  const kept = lines.slice(0, maxLines);
  kept[maxLines - 1] = clip(`${kept[maxLines - 1]}…`, perLine);
  return kept.map((l, i) => (i < maxLines - 1 ? clip(l, perLine) : l));
}

function clip(text: string, max: number): string {
  return text.length <= max ? text : `${text.slice(0, max - 1)}…`;
}

/** Outcome arrows of one check, one per target, labelled with every outcome that leads there. */
function outgoing(check: Check): { to: string; labels: string[] }[] {
  const byTarget = new Map<string, string[]>();
  const add = (to: string, label: string) => byTarget.set(to, [...(byTarget.get(to) ?? []), label]);
  switch (check.kind) {
    case 'measure':
      for (const [verdict, to] of Object.entries(check.outcomes)) if (to) add(to, ARROW_WORDS[verdict as Verdict]);
      break;
    case 'observe':
      for (const choice of check.choices) add(choice.next, clip(choice.label, LABEL_CHARS));
      break;
    case 'task':
      add(check.next, '');
      break;
    case 'finding':
      break;
  }
  return [...byTarget].map(([to, labels]) => ({ to, labels }));
}

export function layoutProcedure(document: ProcedureDocument): ProcedureLayout {
  const g = new dagre.graphlib.Graph({ multigraph: false });
  g.setGraph({ rankdir: 'TB', nodesep: 28, edgesep: 12, ranksep: 44, marginx: 16, marginy: 40 });
  g.setDefaultEdgeLabel(() => ({}));
  const ids = new Set(document.checks.map((c) => c.id));
  const wrapped = new Map<string, string[]>();
  for (const check of document.checks) {
    const lines = wrapTitle(check.title);
    wrapped.set(check.id, lines);
    g.setNode(check.id, { width: NODE_WIDTH, height: NODE_PADDING * 2 + CAPTION_HEIGHT + lines.length * LINE_HEIGHT });
  }
  const labels = new Map<string, string>();
  for (const check of document.checks) {
    for (const { to, labels: words } of outgoing(check)) {
      if (!ids.has(to)) continue;
      const label = words.filter(Boolean).join(' · ');
      labels.set(`${check.id}\u0000${to}`, label);
      g.setEdge(check.id, to, label ? { width: label.length * LABEL_CHAR_WIDTH + 8, height: 16, labelpos: 'c' } : {});
    }
  }
  dagre.layout(g);

  const nodes: DiagramNode[] = document.checks.map((check) => {
    const n = g.node(check.id);
    return { id: check.id, kind: check.kind, lines: wrapped.get(check.id)!, x: n.x!, y: n.y!, width: n.width, height: n.height };
  });
  const edges: DiagramEdge[] = g.edges().map((e) => {
    const label = labels.get(`${e.v}\u0000${e.w}`) ?? '';
    const data = g.edge(e);
    return {
      from: e.v,
      to: e.w,
      label,
      points: (data.points ?? []).map((p: Point) => ({ x: p.x, y: p.y })),
      labelAt: label && data.x !== undefined && data.y !== undefined ? { x: data.x, y: data.y } : null,
    };
  });
  const graph = g.graph();
  return { startId: document.startCheckId, width: graph.width ?? 0, height: graph.height ?? 0, nodes, edges };
}
