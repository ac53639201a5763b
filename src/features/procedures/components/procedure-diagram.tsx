import { useMemo, useRef, useState } from 'react';
import { type LayoutChangeEvent, PanResponder, StyleSheet, View } from 'react-native';
import Svg, { G, Path, Polygon, Rect, Text as SvgText } from 'react-native-svg';
import type { CheckKind, ProcedureDocument } from '@shared/engine/procedure';
import { centreOn, fitToView, type Viewport, zoomBy } from '@shared/editor/viewport';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { layoutProcedure, type DiagramNode } from '@/lib/procedure-layout';
import { fonts, radius, space, useTheme, type Palette } from '@/lib/theme';

/** How a check differs from the version it is compared with; drawn as a word and an outline, not by colour alone. */
export type DiagramMark = 'added' | 'changed' | 'removed';
const MARK_WORDS: Record<DiagramMark, string> = { added: 'NEW', changed: 'CHANGED', removed: 'REMOVED' };

interface DiagramProps {
  document: ProcedureDocument;
  selectedId: string | null;
  flagged: ReadonlySet<string>;
  onSelect?: (id: string) => void;
  marks?: ReadonlyMap<string, DiagramMark>;
  /** Names the diagram to screen readers when two are side by side. */
  label?: string;
  /** Shown at the start of the zoom tools, for a diagram that is one of two. */
  heading?: string;
  testID?: string;
}

/** The procedure as a picture: one shape per check kind, outcomes as labelled arrows; press a check to select it. */
export function ProcedureDiagram({ document, selectedId, flagged, onSelect, marks, label = 'Diagram', heading, testID = 'procedure-diagram' }: DiagramProps) {
  const colors = useTheme();
  const layout = useMemo(() => layoutProcedure(document), [document]);
  const [pane, setPane] = useState({ width: 0, height: 0 });
  const [view, setView] = useState<Viewport | null>(null);
  const shown = view ?? fitToView(layout, pane);
  const onLayout = (e: LayoutChangeEvent) => setPane({ width: e.nativeEvent.layout.width, height: e.nativeEvent.layout.height });
  // Dragging pans; a press without movement still reaches the check under it.
  const shownRef = useRef(shown);
  shownRef.current = shown;
  const dragFrom = useRef<Viewport | null>(null);
  const pan = useMemo(
    () =>
      PanResponder.create({
        onMoveShouldSetPanResponder: (_e, g) => Math.abs(g.dx) + Math.abs(g.dy) > 6,
        onPanResponderGrant: () => {
          dragFrom.current = shownRef.current;
        },
        onPanResponderMove: (_e, g) => {
          const from = dragFrom.current;
          if (from) setView({ ...from, x: from.x + g.dx, y: from.y + g.dy });
        },
        onPanResponderRelease: () => {
          dragFrom.current = null;
        },
      }),
    [],
  );
  const selected = layout.nodes.find((n) => n.id === selectedId);

  return (
    <View style={[styles.wrap, { backgroundColor: colors.surfaceSunken, borderColor: colors.border }]}>
      <View style={styles.tools}>
        {heading ? (
          <Text variant="bodyStrong" style={styles.heading}>
            {heading}
          </Text>
        ) : null}
        <Text variant="label" tone="textMuted">
          {`${Math.round(shown.scale * 100)} %`}
        </Text>
        <Button testID={`${testID}-zoom-out`} label="Zoom out" hideLabel icon="zoomOut" onPress={() => setView(zoomBy(shown, -1, pane))} />
        <Button testID={`${testID}-zoom-in`} label="Zoom in" hideLabel icon="zoomIn" onPress={() => setView(zoomBy(shown, 1, pane))} />
        <Button testID={`${testID}-zoom-fit`} label="Fit" icon="fit" onPress={() => setView(null)} />
        {selected ? <Button testID={`${testID}-zoom-selected`} label="Show selected" onPress={() => setView(centreOn({ ...shown, scale: Math.max(shown.scale, 1) }, selected, pane))} /> : null}
      </View>
      <View style={styles.canvas} onLayout={onLayout} {...pan.panHandlers} testID={testID} role="img" aria-label={`${label} of ${document.checks.length} checks${onSelect ? '; use the check list to select one' : ''}.`}>
        {pane.width > 0 ? (
          <Svg width={pane.width} height={pane.height}>
            <G transform={`translate(${shown.x} ${shown.y}) scale(${shown.scale})`}>
              {layout.edges.map((e) => (
                <G key={`${e.from}>${e.to}`}>
                  <Path d={arrowPath(e.points)} stroke={colors.borderStrong} strokeWidth={1.6} fill="none" />
                  <Path d={arrowHead(e.points)} fill={colors.borderStrong} />
                  {e.label && e.labelAt ? (
                    <G>
                      <Rect x={e.labelAt.x - labelWidth(e.label) / 2} y={e.labelAt.y - 10} width={labelWidth(e.label)} height={20} rx={4} fill={colors.surface} />
                      <SvgText x={e.labelAt.x} y={e.labelAt.y + 4} fontSize={12} fontFamily={fonts.semiBold} fill={colors.textMuted} textAnchor="middle">
                        {e.label}
                      </SvgText>
                    </G>
                  ) : null}
                </G>
              ))}
              {layout.nodes.map((n) => {
                const mark = marks?.get(n.id);
                return (
                <G key={n.id} onPress={onSelect ? () => onSelect(n.id) : undefined}>
                  {mark ? <MarkOutline node={n} mark={mark} colors={colors} /> : null}
                  <NodeShape node={n} colors={colors} selected={n.id === selectedId} flagged={flagged.has(n.id)} />
                  <SvgText x={n.x} y={n.y - n.height / 2 + 15} fontSize={12} fontFamily={fonts.semiBold} fill={colors.textMuted} textAnchor="middle">
                    {`${KIND_WORD[n.kind]}${n.id === document.startCheckId ? ' · start' : ''}${flagged.has(n.id) ? ' · fix' : ''}`}
                  </SvgText>
                  {mark ? <MarkTag node={n} mark={mark} colors={colors} /> : null}
                  {n.lines.map((line, i) => (
                    <SvgText key={i} x={n.x} y={n.y - n.height / 2 + 34 + i * 17} fontSize={14} fontFamily={fonts.semiBold} fill={colors.text} textAnchor="middle">
                      {line}
                    </SvgText>
                  ))}
                </G>
                );
              })}
            </G>
          </Svg>
        ) : null}
      </View>
    </View>
  );
}

const KIND_WORD: Record<CheckKind, string> = { measure: 'MEASURE', observe: 'OBSERVE', task: 'TASK', finding: 'FINDING' };

/** measure: rounded box; observe: hexagon (a choice); task: square-cornered box; finding: box with a heavy base (where a path ends). */
function NodeShape({ node: n, colors, selected, flagged }: { node: DiagramNode; colors: Palette; selected: boolean; flagged: boolean }) {
  const stroke = flagged ? colors.danger : selected ? colors.primary : colors.borderStrong;
  const strokeWidth = selected ? 3.5 : flagged ? 2.5 : 1.5;
  const fill = selected ? colors.primarySoft : colors.surface;
  const left = n.x - n.width / 2;
  const top = n.y - n.height / 2;
  const dash = flagged ? '6 4' : undefined;
  switch (n.kind) {
    case 'observe': {
      const inset = 14;
      const points = [
        [left + inset, top],
        [left + n.width - inset, top],
        [left + n.width, n.y],
        [left + n.width - inset, top + n.height],
        [left + inset, top + n.height],
        [left, n.y],
      ];
      return <Polygon points={points.map((p) => p.join(',')).join(' ')} fill={fill} stroke={stroke} strokeWidth={strokeWidth} strokeDasharray={dash} />;
    }
    case 'finding':
      return (
        <G>
          <Rect x={left} y={top} width={n.width} height={n.height} rx={4} fill={fill} stroke={stroke} strokeWidth={strokeWidth} strokeDasharray={dash} />
          <Rect x={left} y={top + n.height - 6} width={n.width} height={6} fill={colors.signal} />
        </G>
      );
    case 'task':
      return <Rect x={left} y={top} width={n.width} height={n.height} rx={0} fill={fill} stroke={stroke} strokeWidth={strokeWidth} strokeDasharray={dash} />;
    case 'measure':
      return <Rect x={left} y={top} width={n.width} height={n.height} rx={16} fill={fill} stroke={stroke} strokeWidth={strokeWidth} strokeDasharray={dash} />;
  }
}

function markInk(mark: DiagramMark, colors: Palette): string {
  return mark === 'added' ? colors.success : mark === 'removed' ? colors.danger : colors.warning;
}

/** A wide halo around a compared check: solid for new or changed, dashed for removed. */
function MarkOutline({ node: n, mark, colors }: { node: DiagramNode; mark: DiagramMark; colors: Palette }) {
  const gap = 6;
  return (
    <Rect
      x={n.x - n.width / 2 - gap}
      y={n.y - n.height / 2 - gap}
      width={n.width + gap * 2}
      height={n.height + gap * 2}
      rx={10}
      fill="none"
      stroke={markInk(mark, colors)}
      strokeWidth={4}
      strokeDasharray={mark === 'removed' ? '8 5' : undefined}
    />
  );
}

/** The mark in words on a tag straddling the node's top edge. */
function MarkTag({ node: n, mark, colors }: { node: DiagramNode; mark: DiagramMark; colors: Palette }) {
  const word = MARK_WORDS[mark];
  const width = word.length * 8 + 16;
  const top = n.y - n.height / 2 - 6;
  return (
    <G>
      <Rect x={n.x + n.width / 2 - width} y={top - 11} width={width} height={22} rx={11} fill={markInk(mark, colors)} />
      <SvgText x={n.x + n.width / 2 - width / 2} y={top + 4} fontSize={12} fontFamily={fonts.bold} fill={colors.surface} textAnchor="middle">
        {word}
      </SvgText>
    </G>
  );
}

const labelWidth = (label: string) => label.length * 7 + 10;

function arrowPath(points: { x: number; y: number }[]): string {
  return points.map((p, i) => `${i === 0 ? 'M' : 'L'}${p.x},${p.y}`).join(' ');
}

function arrowHead(points: { x: number; y: number }[]): string {
  if (points.length < 2) return '';
  const tip = points[points.length - 1];
  const from = points[points.length - 2];
  const angle = Math.atan2(tip.y - from.y, tip.x - from.x);
  const size = 9;
  const a = { x: tip.x - size * Math.cos(angle - 0.4), y: tip.y - size * Math.sin(angle - 0.4) };
  const b = { x: tip.x - size * Math.cos(angle + 0.4), y: tip.y - size * Math.sin(angle + 0.4) };
  return `M${tip.x},${tip.y} L${a.x},${a.y} L${b.x},${b.y} Z`;
}

const styles = StyleSheet.create({
  wrap: { flex: 1, borderWidth: 1, borderRadius: radius.lg, overflow: 'hidden' },
  tools: { flexDirection: 'row', alignItems: 'center', gap: space.sm, padding: space.sm, justifyContent: 'flex-end' },
  heading: { flex: 1 },
  canvas: { flex: 1, minHeight: 160 },
});
