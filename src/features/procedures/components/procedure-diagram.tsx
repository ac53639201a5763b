import { useCallback, useMemo, useRef, useState } from 'react';
import { type LayoutChangeEvent, PanResponder, StyleSheet, View } from 'react-native';
import Svg, { G } from 'react-native-svg';
import type { ProcedureDocument } from '@shared/engine/procedure';
import { centreOn, fitToView, type Viewport, wheelFactor, zoomAt, zoomBy } from '@shared/editor/viewport';
import { DiagramDrawing, type NodeMarks } from '@/components/diagram/diagram-drawing';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { keyOf, SHORTCUTS } from '@/features/procedures/editor-keys';
import { useShortcutKeys } from '@/lib/use-shortcut-keys';
import { useWheelZoom } from '@/features/procedures/use-wheel-zoom';
import { type DiagramNode, layoutProcedure, LEGIBLE_SCALE } from '@/lib/procedure-layout';
import { type Palette, radius, space, useTheme } from '@/lib/theme';

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
  /** The editor's own diagram: zoom keys and the list of shortcuts. */
  shortcuts?: boolean;
  testID?: string;
}

/**
 * The procedure as a picture in the editor: press a check to select it; drag to pan; the wheel zooms about the
 * pointer. "Fit" shows the whole procedure when its text stays legible, else the full width from the start check.
 */
export function ProcedureDiagram({ document, selectedId, flagged, onSelect, marks, label = 'Diagram', heading, shortcuts = false, testID = 'procedure-diagram' }: DiagramProps) {
  const colors = useTheme();
  const layout = useMemo(() => layoutProcedure(document), [document]);
  const [pane, setPane] = useState({ width: 0, height: 0 });
  const [view, setView] = useState<Viewport | null>(null);
  const [showKeys, setShowKeys] = useState(false);
  const start = layout.nodes.find((n) => n.id === layout.startId);
  const shown = view ?? fitToView(layout, pane, LEGIBLE_SCALE, start);
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
  const canvas = useRef<View>(null);
  useWheelZoom(canvas, (deltaY, point) => setView(zoomAt(shownRef.current, wheelFactor(deltaY), point)));
  const zoomIn = () => setView(zoomBy(shownRef.current, 1, pane));
  const zoomOut = () => setView(zoomBy(shownRef.current, -1, pane));
  useShortcutKeys(keyOf, shortcuts ? { zoomIn, zoomOut, fit: () => setView(null) } : {});
  const selected = layout.nodes.find((n) => n.id === selectedId);

  const nodeMarks = useCallback(
    (n: DiagramNode): NodeMarks => {
      const mark = marks?.get(n.id);
      return {
        highlight: n.id === selectedId ? 'selected' : undefined,
        flagged: flagged.has(n.id),
        ring: mark ? { color: markInk(mark, colors), dashed: mark === 'removed' } : undefined,
        tag: mark ? { text: MARK_WORDS[mark], fill: markInk(mark, colors), ink: colors.surface, side: 'right' } : undefined,
      };
    },
    [marks, selectedId, flagged, colors],
  );

  return (
    <View style={[styles.wrap, { backgroundColor: colors.surfaceSunken, borderColor: colors.border }]}>
      <View style={styles.tools}>
        {heading ? (
          <Text variant="bodyStrong" style={styles.heading}>
            {heading}
          </Text>
        ) : null}
        <Text variant="label" tone="textMuted" testID={`${testID}-zoom`}>
          {`${Math.round(shown.scale * 100)} %`}
        </Text>
        <Button testID={`${testID}-zoom-out`} label="Zoom out" hideLabel icon="zoomOut" onPress={zoomOut} />
        <Button testID={`${testID}-zoom-in`} label="Zoom in" hideLabel icon="zoomIn" onPress={zoomIn} />
        <Button testID={`${testID}-zoom-fit`} label="Fit" icon="fit" onPress={() => setView(null)} />
        {selected ? <Button testID={`${testID}-zoom-selected`} label="Show selected" onPress={() => setView(centreOn({ ...shown, scale: Math.max(shown.scale, 1) }, selected, pane))} /> : null}
        {shortcuts ? <Button testID={`${testID}-keys`} label="Keys" ariaLabel="Keyboard shortcuts" selected={showKeys} onPress={() => setShowKeys((s) => !s)} /> : null}
      </View>
      {showKeys ? (
        <View style={[styles.keys, { backgroundColor: colors.surface, borderColor: colors.border }]} testID={`${testID}-shortcuts`} role="list" aria-label="Keyboard shortcuts">
          {SHORTCUTS.map((s) => (
            <View key={s.key} role="listitem" style={styles.keyRow}>
              <Text variant="bodyStrong" style={styles.keyName}>
                {s.keys}
              </Text>
              <Text variant="small">{s.does}</Text>
            </View>
          ))}
          <Text variant="small" tone="textMuted">
            Not while typing in a field. Drag the diagram to pan it.
          </Text>
        </View>
      ) : null}
      <View
        ref={canvas}
        style={styles.canvas}
        onLayout={onLayout}
        {...pan.panHandlers}
        testID={testID}
        role="img"
        aria-label={`${label} of ${document.checks.length} checks${onSelect ? '; use the check list to select one' : ''}.`}
      >
        {pane.width > 0 ? (
          <Svg width={pane.width} height={pane.height}>
            <G transform={`translate(${shown.x} ${shown.y}) scale(${shown.scale})`}>
              <DiagramDrawing layout={layout} nodeMarks={nodeMarks} onPressNode={onSelect} />
            </G>
          </Svg>
        ) : null}
      </View>
    </View>
  );
}

function markInk(mark: DiagramMark, colors: Palette): string {
  return mark === 'added' ? colors.success : mark === 'removed' ? colors.danger : colors.warning;
}

const styles = StyleSheet.create({
  wrap: { flex: 1, borderWidth: 1, borderRadius: radius.lg, overflow: 'hidden' },
  tools: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm, padding: space.sm, justifyContent: 'flex-end' },
  heading: { flex: 1 },
  keys: { marginHorizontal: space.sm, marginBottom: space.sm, padding: space.md, gap: space.xs, borderWidth: 1, borderRadius: radius.md },
  keyRow: { flexDirection: 'row', gap: space.md, alignItems: 'baseline' },
  keyName: { minWidth: 170 },
  canvas: { flex: 1, minHeight: 160 },
});
