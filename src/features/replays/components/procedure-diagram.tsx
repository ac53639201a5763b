import { useEffect, useMemo, useRef, useState } from 'react';
import { type LayoutChangeEvent, ScrollView, StyleSheet, View } from 'react-native';
import Svg, { G, Path, Rect, Text as SvgText } from 'react-native-svg';
import type { CheckKind } from '@shared/engine/procedure';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { edgeKey, type ReplayPath } from '@/features/replays/replay-path';
import { type DiagramEdge, type DiagramNode, LINE_HEIGHT, type ProcedureLayout } from '@/lib/procedure-layout';
import { fonts, type Palette, radius, space, useTheme } from '@/lib/theme';

interface ProcedureDiagramProps {
  layout: ProcedureLayout;
  path: ReplayPath;
  /** The check of the step on screen; the diagram scrolls to keep it in view. */
  currentId: string | null;
  /** Label of the current check's tag, e.g. "Step 3". */
  currentTag: string;
  /** Height of the scrolling view; without it the diagram fills its parent. */
  height?: number;
  /** Screen-reader summary of where the path went. */
  summary: string;
  /** How often each arrow was taken, by edgeKey: written on the arrows and drawn as their weight (insight). */
  counts?: ReadonlyMap<string, number>;
}

/** Close up: node titles at about 13 px. */
const CLOSE_UP = 0.85;

/**
 * The procedure as a picture: checks as shapes by kind, outcomes as labelled arrows, the path taken drawn
 * thick, detours dashed, and the current check outlined and tagged. Too big for a pane at a readable size,
 * so it scrolls both ways and follows the current check.
 */
export function ProcedureDiagram({ layout, path, currentId, currentTag, height, summary, counts }: ProcedureDiagramProps) {
  const c = useTheme();
  const outer = useRef<ScrollView>(null);
  const inner = useRef<ScrollView>(null);
  const [viewportWidth, setViewportWidth] = useState(0);
  const [viewportHeight, setViewportHeight] = useState(height ?? 0);
  const [whole, setWhole] = useState(false);
  const current = layout.nodes.find((n) => n.id === currentId) ?? null;
  const scale = whole && viewportWidth > 0 ? Math.min(CLOSE_UP, viewportWidth / layout.width) : CLOSE_UP;

  // Glide from step to step, but jump straight there when the diagram first appears or changes size.
  const placed = useRef(false);
  useEffect(() => {
    if (!current || viewportWidth === 0) return;
    const animated = placed.current && !whole;
    inner.current?.scrollTo({ x: Math.max(0, current.x * scale - viewportWidth / 2), animated });
    outer.current?.scrollTo({ y: Math.max(0, current.y * scale - viewportHeight / 2), animated });
    placed.current = true;
  }, [current, viewportWidth, viewportHeight, scale, whole]);

  // Path arrows go on top of the rest so a crossing never hides them.
  const most = counts ? Math.max(1, ...counts.values()) : 1;
  const edges = useMemo(() => {
    const rank = (e: DiagramEdge) => (path.taken.has(edgeKey(e.from, e.to)) ? 2 : path.detours.has(edgeKey(e.from, e.to)) ? 1 : 0);
    return [...layout.edges].sort((a, b) => rank(a) - rank(b));
  }, [layout.edges, path]);

  return (
    <View style={[styles.frame, height === undefined && styles.fill]}>
      <View style={styles.zoom} role="group" aria-label="Diagram size">
        <Button testID="diagram-close-up" label="Close up" selected={!whole} onPress={() => setWhole(false)} />
        <Button testID="diagram-whole" label="Whole procedure" selected={whole} onPress={() => setWhole(true)} />
      </View>
      <View
        testID="procedure-diagram"
        onLayout={(e: LayoutChangeEvent) => setViewportHeight(e.nativeEvent.layout.height)}
        style={[styles.viewport, height === undefined ? styles.fill : { height }, { borderColor: c.border, backgroundColor: c.surfaceSunken }]}
      >
        {/* Focusable so the keyboard can scroll it too. */}
        <ScrollView ref={outer} nestedScrollEnabled tabIndex={0} aria-label="Procedure diagram, scrolls up and down">
          <ScrollView
            ref={inner}
            horizontal
            nestedScrollEnabled
            tabIndex={0}
            aria-label="Procedure diagram, scrolls sideways"
            onLayout={(e: LayoutChangeEvent) => setViewportWidth(e.nativeEvent.layout.width)}
          >
            <View role="img" aria-label={summary}>
              <Svg width={layout.width * scale} height={layout.height * scale} viewBox={`0 0 ${layout.width} ${layout.height}`} aria-hidden>
                {edges.map((e) => (
                  <Arrow
                    key={edgeKey(e.from, e.to)}
                    edge={e}
                    state={path.taken.has(edgeKey(e.from, e.to)) ? 'taken' : path.detours.has(edgeKey(e.from, e.to)) ? 'detour' : 'idle'}
                    count={counts ? (counts.get(edgeKey(e.from, e.to)) ?? 0) : null}
                    most={most}
                    c={c}
                  />
                ))}
                {layout.nodes.map((n) => (
                  <Node key={n.id} node={n} visited={path.visited.has(n.id)} current={n.id === currentId} c={c} />
                ))}
                {current ? <CurrentTag node={current} text={currentTag} c={c} /> : null}
              </Svg>
            </View>
          </ScrollView>
        </ScrollView>
      </View>
      {whole ? null : (
        <Text variant="small" tone="textMuted">
          Scroll the diagram to see the rest of the procedure.
        </Text>
      )}
      <Legend c={c} weighted={counts !== undefined} />
    </View>
  );
}

interface ArrowProps {
  edge: DiagramEdge;
  state: 'taken' | 'detour' | 'idle';
  /** Times taken, for insight; null in a replay. */
  count: number | null;
  most: number;
  c: Palette;
}

function Arrow({ edge, state, count, most, c }: ArrowProps) {
  const pts = edge.points;
  if (pts.length < 2) return null;
  const d = pts.map((p, i) => `${i === 0 ? 'M' : 'L'}${p.x.toFixed(1)} ${p.y.toFixed(1)}`).join('');
  const stroke = state === 'taken' ? c.primary : state === 'detour' ? c.danger : c.borderStrong;
  const widthOf = count ? 2 + (6 * count) / most : state === 'taken' ? 4.5 : state === 'detour' ? 3 : 1.5;
  const label = count ? [edge.label, `×${count}`].filter(Boolean).join(' · ') : edge.label;
  const labelAt = edge.labelAt ?? (count ? pts[pts.length >> 1] : null);
  const [a, b] = [pts[pts.length - 2], pts[pts.length - 1]];
  const angle = Math.atan2(b.y - a.y, b.x - a.x);
  const size = state === 'idle' ? 8 : 12;
  const head = [angle + Math.PI * 0.85, angle - Math.PI * 0.85].map((t) => `${(b.x + size * Math.cos(t)).toFixed(1)} ${(b.y + size * Math.sin(t)).toFixed(1)}`);
  const labelWidth = label.length * 7.2 + 8;
  return (
    <G>
      <Path d={d} stroke={stroke} strokeWidth={widthOf} fill="none" strokeDasharray={state === 'detour' ? '8 6' : undefined} strokeLinejoin="round" />
      <Path d={`M${b.x} ${b.y}L${head[0]}L${head[1]}Z`} fill={stroke} />
      {labelAt && label ? (
        <G>
          <Rect x={labelAt.x - labelWidth / 2} y={labelAt.y - 10} width={labelWidth} height={20} rx={4} fill={c.surfaceSunken} />
          <SvgText x={labelAt.x} y={labelAt.y + 4.5} fontSize={13} fontFamily={state === 'idle' ? fonts.regular : fonts.bold} fill={state === 'idle' ? c.textMuted : c.text} textAnchor="middle">
            {label}
          </SvgText>
        </G>
      ) : null}
    </G>
  );
}

/** Outline of a check by kind: measure rounded, observe pointed, task square, finding a stadium. */
function shapePath(kind: CheckKind, x: number, y: number, w: number, h: number): string {
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

function Node({ node, visited, current, c }: { node: DiagramNode; visited: boolean; current: boolean; c: Palette }) {
  const top = node.y - (node.lines.length * LINE_HEIGHT) / 2 + 14;
  return (
    <G>
      {current ? <Path d={shapePath(node.kind, node.x, node.y, node.width + 14, node.height + 14)} fill="none" stroke={c.signal} strokeWidth={5} /> : null}
      <Path
        d={shapePath(node.kind, node.x, node.y, node.width, node.height)}
        fill={visited ? c.primarySoft : c.surface}
        stroke={visited ? c.primary : c.borderStrong}
        strokeWidth={visited ? 3 : 1.5}
      />
      {node.kind === 'finding' ? (
        <Path d={shapePath('finding', node.x, node.y, node.width - 10, node.height - 10)} fill="none" stroke={visited ? c.primary : c.borderStrong} strokeWidth={1} />
      ) : null}
      {node.kind === 'task' ? <Rect x={node.x - node.width / 2} y={node.y - node.height / 2} width={8} height={node.height} fill={visited ? c.primary : c.borderStrong} /> : null}
      {node.lines.map((line, i) => (
        <SvgText key={i} x={node.x} y={top + i * LINE_HEIGHT} fontSize={15} fontFamily={visited ? fonts.semiBold : fonts.regular} fill={c.text} textAnchor="middle">
          {line}
        </SvgText>
      ))}
    </G>
  );
}

function CurrentTag({ node, text, c }: { node: DiagramNode; text: string; c: Palette }) {
  const w = text.length * 8 + 20;
  const x = node.x - node.width / 2 - 4;
  const y = node.y - node.height / 2 - 30;
  return (
    <G>
      <Rect x={x} y={y} width={w} height={22} rx={11} fill={c.chrome} />
      <SvgText x={x + w / 2} y={y + 16} fontSize={13} fontFamily={fonts.bold} fill={c.onChrome} textAnchor="middle">
        {text}
      </SvgText>
    </G>
  );
}

const LEGEND: { kind: CheckKind; label: string }[] = [
  { kind: 'measure', label: 'Measure' },
  { kind: 'observe', label: 'Observe' },
  { kind: 'task', label: 'Task' },
  { kind: 'finding', label: 'Finding' },
];

function Legend({ c, weighted }: { c: Palette; weighted: boolean }) {
  return (
    <View style={styles.legend} aria-hidden>
      {LEGEND.map(({ kind, label }) => (
        <View key={kind} style={styles.legendItem}>
          <Svg width={34} height={20} viewBox="0 0 34 20">
            <Path d={shapePath(kind, 17, 10, 32, 18)} fill={c.surface} stroke={c.borderStrong} strokeWidth={1.5} />
          </Svg>
          <Text variant="small">{label}</Text>
        </View>
      ))}
      <View style={styles.legendItem}>
        <Svg width={34} height={20} viewBox="0 0 34 20">
          <Path d="M2 10H32" stroke={c.primary} strokeWidth={4.5} />
        </Svg>
        <Text variant="small">{weighted ? 'Taken: thicker means more often' : 'Path taken'}</Text>
      </View>
      {weighted ? null : (
        <>
          <View style={styles.legendItem}>
            <Svg width={34} height={20} viewBox="0 0 34 20">
              <Path d="M2 10H32" stroke={c.danger} strokeWidth={3} strokeDasharray="8 6" />
            </Svg>
            <Text variant="small">Taken back</Text>
          </View>
          <View style={styles.legendItem}>
            <Svg width={34} height={20} viewBox="0 0 34 20">
              <Rect x={3} y={3} width={28} height={14} rx={5} fill="none" stroke={c.signal} strokeWidth={4} />
            </Svg>
            <Text variant="small">This step</Text>
          </View>
        </>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  frame: { gap: space.sm },
  fill: { flex: 1 },
  zoom: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  viewport: { borderWidth: 1, borderRadius: radius.md, overflow: 'hidden' },
  legend: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.lg, rowGap: space.xs },
  legendItem: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
});
