import { type ReactNode, useMemo } from 'react';
import { StyleSheet, View } from 'react-native';
import Svg, { G, Path, Rect, Text as SvgText } from 'react-native-svg';
import type { CheckKind } from '@shared/engine/procedure';
import { Text } from '@/components/ui/text';
import { CAPTION_HEIGHT, DIAGRAM_FONT, type DiagramEdge, type DiagramNode, LABEL_CHAR_WIDTH, LINE_HEIGHT, NODE_PADDING, type ProcedureLayout } from '@/lib/procedure-layout';
import { fonts, type Palette, space, useTheme } from '@/lib/theme';

/**
 * The one drawing of a procedure diagram: checks as shapes by kind with their kind word and title, outcomes as
 * labelled arrows. The editor and the replay/insight viewers differ only in the marks they pass: selection and
 * problems, comparison halos, the path taken, the current step, counts on arrows. Drawn in diagram units; the
 * caller sizes and moves the picture.
 */

export interface NodeMarks {
  /** `selected` in the editor, `visited` on a replay's path: filled and outlined in the primary colour. */
  highlight?: 'selected' | 'visited';
  /** Has a problem to fix: a dashed red outline and "fix" in its caption. */
  flagged?: boolean;
  /** A halo around the node: the current step, or how a compared check changed. */
  ring?: { color: string; dashed?: boolean };
  /** Words on a pill at the node's top edge, e.g. "Step 3" or "CHANGED". */
  tag?: { text: string; fill: string; ink: string; side: 'left' | 'right' };
}

export interface EdgeMarks {
  /** `taken` on the path, `detour` for steps taken back. */
  state: 'idle' | 'taken' | 'detour';
  /** How often the arrow was taken (insight): written on it and drawn as its weight. */
  count?: number;
}

interface DrawingProps {
  layout: ProcedureLayout;
  nodeMarks?: (node: DiagramNode) => NodeMarks;
  edgeMarks?: (edge: DiagramEdge) => EdgeMarks;
  onPressNode?: (id: string) => void;
}

const NO_MARKS: NodeMarks = {};
const IDLE: EdgeMarks = { state: 'idle' };
const KIND_WORD: Record<CheckKind, string> = { measure: 'MEASURE', observe: 'OBSERVE', task: 'TASK', finding: 'FINDING' };
const RANK = { idle: 0, detour: 1, taken: 2 } as const;

export function DiagramDrawing({ layout, nodeMarks = () => NO_MARKS, edgeMarks = () => IDLE, onPressNode }: DrawingProps) {
  const c = useTheme();
  // Marked arrows go on top of the rest so a crossing never hides them.
  const edges = useMemo(() => layout.edges.map((edge) => ({ edge, marks: edgeMarks(edge) })).sort((a, b) => RANK[a.marks.state] - RANK[b.marks.state]), [layout.edges, edgeMarks]);
  const most = Math.max(1, ...edges.map((e) => e.marks.count ?? 0));
  return (
    <G>
      {edges.map(({ edge, marks }) => (
        <Arrow key={`${edge.from}>${edge.to}`} edge={edge} marks={marks} most={most} c={c} />
      ))}
      {layout.nodes.map((n) => (
        <Node key={n.id} node={n} start={n.id === layout.startId} marks={nodeMarks(n)} c={c} onPress={onPressNode ? () => onPressNode(n.id) : undefined} />
      ))}
    </G>
  );
}

function Arrow({ edge, marks, most, c }: { edge: DiagramEdge; marks: EdgeMarks; most: number; c: Palette }) {
  const pts = edge.points;
  if (pts.length < 2) return null;
  const { state, count } = marks;
  const d = pts.map((p, i) => `${i === 0 ? 'M' : 'L'}${p.x.toFixed(1)} ${p.y.toFixed(1)}`).join('');
  const stroke = state === 'taken' ? c.primary : state === 'detour' ? c.danger : c.borderStrong;
  const width = count ? 2 + (6 * count) / most : state === 'taken' ? 4.5 : state === 'detour' ? 3 : 1.6;
  const label = count ? [edge.label, `×${count}`].filter(Boolean).join(' · ') : edge.label;
  const labelAt = edge.labelAt ?? (count ? pts[pts.length >> 1] : null);
  const [a, b] = [pts[pts.length - 2], pts[pts.length - 1]];
  const angle = Math.atan2(b.y - a.y, b.x - a.x);
  const size = state === 'idle' ? 9 : 12;
  const head = [angle + Math.PI * 0.85, angle - Math.PI * 0.85].map((t) => `${(b.x + size * Math.cos(t)).toFixed(1)} ${(b.y + size * Math.sin(t)).toFixed(1)}`);
  const labelWidth = label.length * LABEL_CHAR_WIDTH + 10;
  return (
    <G>
      <Path d={d} stroke={stroke} strokeWidth={width} fill="none" strokeDasharray={state === 'detour' ? '8 6' : undefined} strokeLinejoin="round" />
      <Path d={`M${b.x} ${b.y}L${head[0]}L${head[1]}Z`} fill={stroke} />
      {labelAt && label ? (
        <G>
          <Rect x={labelAt.x - labelWidth / 2} y={labelAt.y - 10} width={labelWidth} height={20} rx={4} fill={c.surfaceSunken} />
          <SvgText x={labelAt.x} y={labelAt.y + 4.5} fontSize={DIAGRAM_FONT.label} fontFamily={state === 'idle' ? fonts.semiBold : fonts.bold} fill={state === 'idle' ? c.textMuted : c.text} textAnchor="middle">
            {label}
          </SvgText>
        </G>
      ) : null}
    </G>
  );
}

/** Outline of a check by kind: measure rounded, observe pointed (a choice), task square, finding a stadium (where a path ends). */
export function shapePath(kind: CheckKind, x: number, y: number, w: number, h: number): string {
  const l = x - w / 2;
  const r = x + w / 2;
  const t = y - h / 2;
  const b = y + h / 2;
  switch (kind) {
    case 'measure':
      return roundedRect(l, t, w, h, 12);
    case 'observe': {
      const p = 16;
      return `M${l + p} ${t}H${r - p}L${r} ${y}L${r - p} ${b}H${l + p}L${l} ${y}Z`;
    }
    case 'task':
      return `M${l} ${t}H${r}V${b}H${l}Z`;
    case 'finding':
      return roundedRect(l, t, w, h, h / 2);
  }
}

function roundedRect(l: number, t: number, w: number, h: number, rr: number): string {
  const r = Math.min(rr, h / 2, w / 2);
  return `M${l + r} ${t}H${l + w - r}A${r} ${r} 0 0 1 ${l + w} ${t + r}V${t + h - r}A${r} ${r} 0 0 1 ${l + w - r} ${t + h}H${l + r}A${r} ${r} 0 0 1 ${l} ${t + h - r}V${t + r}A${r} ${r} 0 0 1 ${l + r} ${t}Z`;
}

function Node({ node: n, start, marks, c, onPress }: { node: DiagramNode; start: boolean; marks: NodeMarks; c: Palette; onPress?: () => void }) {
  const { highlight, flagged, ring, tag } = marks;
  const stroke = flagged ? c.danger : highlight ? c.primary : c.borderStrong;
  const strokeWidth = highlight === 'selected' ? 3.5 : highlight === 'visited' ? 3 : flagged ? 2.5 : 1.5;
  const top = n.y - n.height / 2 + NODE_PADDING;
  const caption = `${KIND_WORD[n.kind]}${start ? ' · start' : ''}${flagged ? ' · fix' : ''}`;
  return (
    <G onPress={onPress}>
      {ring ? <Path d={shapePath(n.kind, n.x, n.y, n.width + 14, n.height + 14)} fill="none" stroke={ring.color} strokeWidth={5} strokeDasharray={ring.dashed ? '8 5' : undefined} /> : null}
      <Path d={shapePath(n.kind, n.x, n.y, n.width, n.height)} fill={highlight ? c.primarySoft : c.surface} stroke={stroke} strokeWidth={strokeWidth} strokeDasharray={flagged ? '6 4' : undefined} />
      {n.kind === 'finding' ? <Path d={shapePath('finding', n.x, n.y, n.width - 10, n.height - 10)} fill="none" stroke={stroke} strokeWidth={1} /> : null}
      {n.kind === 'task' ? <Rect x={n.x - n.width / 2} y={n.y - n.height / 2} width={8} height={n.height} fill={stroke} /> : null}
      <SvgText x={n.x} y={top + 12} fontSize={DIAGRAM_FONT.caption} fontFamily={fonts.semiBold} fill={flagged ? c.danger : c.textMuted} textAnchor="middle">
        {caption}
      </SvgText>
      {n.lines.map((line, i) => (
        <SvgText key={i} x={n.x} y={top + CAPTION_HEIGHT + 14 + i * LINE_HEIGHT} fontSize={DIAGRAM_FONT.title} fontFamily={highlight ? fonts.bold : fonts.semiBold} fill={c.text} textAnchor="middle">
          {line}
        </SvgText>
      ))}
      {tag ? <Tag node={n} tag={tag} /> : null}
    </G>
  );
}

/** A pill straddling the node's top edge, on its left or right. */
function Tag({ node: n, tag }: { node: DiagramNode; tag: NonNullable<NodeMarks['tag']> }) {
  const width = tag.text.length * 8 + 20;
  const x = tag.side === 'left' ? n.x - n.width / 2 - 4 : n.x + n.width / 2 + 4 - width;
  const y = n.y - n.height / 2 - 18;
  return (
    <G>
      <Rect x={x} y={y} width={width} height={22} rx={11} fill={tag.fill} />
      <SvgText x={x + width / 2} y={y + 16} fontSize={DIAGRAM_FONT.label} fontFamily={fonts.bold} fill={tag.ink} textAnchor="middle">
        {tag.text}
      </SvgText>
    </G>
  );
}

const KINDS: { kind: CheckKind; label: string }[] = [
  { kind: 'measure', label: 'Measure' },
  { kind: 'observe', label: 'Observe' },
  { kind: 'task', label: 'Task' },
  { kind: 'finding', label: 'Finding' },
];

/** What the shapes (and any extra strokes the viewer uses) mean, drawn with the same shapes. */
export function DiagramLegend({ extra = [] }: { extra?: { key: string; swatch: (c: Palette) => ReactNode; label: string }[] }) {
  const c = useTheme();
  return (
    <View style={styles.legend} aria-hidden>
      {KINDS.map(({ kind, label }) => (
        <View key={kind} style={styles.item}>
          <Svg width={34} height={20} viewBox="0 0 34 20">
            <Path d={shapePath(kind, 17, 10, 32, 18)} fill={c.surface} stroke={c.borderStrong} strokeWidth={1.5} />
          </Svg>
          <Text variant="small">{label}</Text>
        </View>
      ))}
      {extra.map((e) => (
        <View key={e.key} style={styles.item}>
          <Svg width={34} height={20} viewBox="0 0 34 20">
            {e.swatch(c)}
          </Svg>
          <Text variant="small">{e.label}</Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  legend: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.lg, rowGap: space.xs },
  item: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
});
