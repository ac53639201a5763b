import { useCallback, useEffect, useRef, useState } from 'react';
import { type LayoutChangeEvent, ScrollView, StyleSheet, View } from 'react-native';
import Svg, { Path, Rect } from 'react-native-svg';
import { DiagramDrawing, DiagramLegend, type EdgeMarks, type NodeMarks } from '@/components/diagram/diagram-drawing';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { edgeKey, type ReplayPath } from '@/features/replays/replay-path';
import { type DiagramEdge, type DiagramNode, LEGIBLE_SCALE, type ProcedureLayout } from '@/lib/procedure-layout';
import { type Palette, radius, space, useTheme } from '@/lib/theme';

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

/** Close up: the smallest text of the diagram at a legible 12 px. */
const CLOSE_UP = LEGIBLE_SCALE;

/**
 * The procedure as a picture: checks as shapes by kind, outcomes as labelled arrows, the path taken drawn
 * thick, detours dashed, and the current check outlined and tagged. Too big for a pane at a readable size,
 * so it scrolls both ways and follows the current check (or opens on the start when there is none).
 */
export function ProcedureDiagram({ layout, path, currentId, currentTag, height, summary, counts }: ProcedureDiagramProps) {
  const c = useTheme();
  const outer = useRef<ScrollView>(null);
  const inner = useRef<ScrollView>(null);
  const [viewportWidth, setViewportWidth] = useState(0);
  const [viewportHeight, setViewportHeight] = useState(height ?? 0);
  const [whole, setWhole] = useState(false);
  const current = layout.nodes.find((n) => n.id === currentId) ?? null;
  // Where the close-up looks: the current check, or the start when there is none (insight).
  const focus = current ?? layout.nodes.find((n) => n.id === layout.startId) ?? null;
  const scale = whole && viewportWidth > 0 ? Math.min(CLOSE_UP, viewportWidth / layout.width) : CLOSE_UP;

  // Glide from step to step, but jump straight there when the diagram first appears or changes size.
  const placed = useRef(false);
  useEffect(() => {
    if (!focus || viewportWidth === 0) return;
    const animated = placed.current && !whole;
    inner.current?.scrollTo({ x: Math.max(0, focus.x * scale - viewportWidth / 2), animated });
    outer.current?.scrollTo({ y: Math.max(0, focus.y * scale - viewportHeight / 2), animated });
    placed.current = true;
  }, [focus, viewportWidth, viewportHeight, scale, whole]);

  const nodeMarks = useCallback(
    (n: DiagramNode): NodeMarks => ({
      highlight: path.visited.has(n.id) ? 'visited' : undefined,
      ring: n.id === currentId ? { color: c.signal } : undefined,
      tag: n.id === currentId && currentTag ? { text: currentTag, fill: c.chrome, ink: c.onChrome, side: 'left' } : undefined,
    }),
    [path, currentId, currentTag, c],
  );
  const edgeMarks = useCallback(
    (e: DiagramEdge): EdgeMarks => {
      const key = edgeKey(e.from, e.to);
      return { state: path.taken.has(key) ? 'taken' : path.detours.has(key) ? 'detour' : 'idle', count: counts ? (counts.get(key) ?? 0) : undefined };
    },
    [path, counts],
  );

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
                <DiagramDrawing layout={layout} nodeMarks={nodeMarks} edgeMarks={edgeMarks} />
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
      <DiagramLegend extra={legendFor(counts !== undefined)} />
    </View>
  );
}

/** Insight draws weights; a replay draws the path, its detours and the step on screen. */
function legendFor(weighted: boolean) {
  const taken = { key: 'taken', swatch: (c: Palette) => <Path d="M2 10H32" stroke={c.primary} strokeWidth={4.5} />, label: weighted ? 'Taken: thicker means more often' : 'Path taken' };
  if (weighted) return [taken];
  return [
    taken,
    { key: 'detour', swatch: (c: Palette) => <Path d="M2 10H32" stroke={c.danger} strokeWidth={3} strokeDasharray="8 6" />, label: 'Taken back' },
    { key: 'current', swatch: (c: Palette) => <Rect x={3} y={3} width={28} height={14} rx={5} fill="none" stroke={c.signal} strokeWidth={4} />, label: 'This step' },
  ];
}

const styles = StyleSheet.create({
  frame: { gap: space.sm },
  fill: { flex: 1 },
  zoom: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  viewport: { borderWidth: 1, borderRadius: radius.md, overflow: 'hidden' },
});
