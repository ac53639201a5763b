import { useId, useState } from 'react';
import { type LayoutChangeEvent, StyleSheet, View } from 'react-native';
import Svg, { Defs, G, Line, Path, Pattern, Rect, Text as SvgText } from 'react-native-svg';
import { specBarGeometry, type SpecBarGeometry } from '@shared/diagnosis/spec-bar-geometry';
import type { Evaluation } from '@shared/engine/evaluate';
import type { Quantity } from '@shared/engine/quantity';
import type { Spec } from '@shared/engine/spec';
import { formatValue } from '@shared/engine/units';
import { fonts, type Palette, useTheme } from '@/lib/theme';

export interface SpecBarProps {
  spec: Spec;
  quantity: Quantity;
  /**
   * The reading judged by `evaluate` (its limits are the temperature-corrected ones), or before a reading
   * the limits alone from `windowOnly`.
   */
  evaluation: Evaluation;
  /** The meter's half-width at a value (`checkUncertainty`); without it the evaluation's own uncertainty is used. */
  uncertaintyAt?: (value: number) => number;
  /** `compact` for lists of steps: shorter, no label over the marker. */
  size?: 'full' | 'compact';
  testID?: string;
}

/** JetBrains Mono advances 0.6 em per character, so label widths are known before drawing. */
const MONO_ADVANCE = 0.6;
const OL_ZONE = 46;
const OL_GAP = 10;
const PAD = 4;
const LABEL_GAP = 16;

/**
 * The spec as a picture: a horizontal scale with the acceptance window, the marginal bands either side of
 * each limit, and the reading's marker; over range (OL) has its own zone past the end.
 */
export function SpecBar({ spec, quantity, evaluation, uncertaintyAt, size = 'full', testID = 'spec-bar' }: SpecBarProps) {
  const colors = useTheme();
  const [width, setWidth] = useState(0);
  const hatchId = `hatch${useId().replace(/[^a-zA-Z0-9]/g, '')}`;
  const geometry = specBarGeometry(spec, quantity, evaluation, uncertaintyAt);
  if (!geometry) return null;

  const compact = size === 'compact';
  const height = compact ? 58 : 104;
  const fmt = (v: number) => (spec.kind === 'ratio' ? `${Number(v.toPrecision(3))}×` : formatValue(v, quantity));
  const onLayout = (e: LayoutChangeEvent) => setWidth(Math.round(e.nativeEvent.layout.width));

  return (
    <View testID={testID} role="img" aria-label={describe(geometry, fmt)} onLayout={onLayout} style={[styles.wrap, { height }]}>
      {width > 0 ? (
        <Drawing geometry={geometry} width={width} height={height} compact={compact} colors={colors} hatchId={hatchId} fmt={fmt} />
      ) : null}
    </View>
  );
}

interface DrawingProps {
  geometry: SpecBarGeometry;
  width: number;
  height: number;
  compact: boolean;
  colors: Palette;
  hatchId: string;
  fmt: (v: number) => string;
}

function Drawing({ geometry: g, width, height, compact, colors: c, hatchId, fmt }: DrawingProps) {
  const trackTop = compact ? 6 : 36;
  const trackHeight = compact ? 24 : 32;
  const trackBottom = trackTop + trackHeight;
  const left = PAD;
  const right = width - PAD - OL_ZONE - OL_GAP;
  const x = (at: number) => left + at * (right - left);
  const olLeft = right + OL_GAP;
  const labelSize = compact ? 13 : 15;
  const labelY = trackBottom + (compact ? 18 : 24);
  const charWidth = labelSize * MONO_ADVANCE;

  const limitLabels = spreadLabels(
    g.limits.map((l) => ({ key: l.side, text: fmt(l.value), cx: x(l.at), w: fmt(l.value).length * charWidth })),
    left,
    right,
  );
  const endLabels: Label[] = [fmt(g.scaleMin), fmt(g.scaleMax)].map((text, i) => {
    const w = text.length * charWidth;
    return { key: i === 0 ? 'start' : 'end', text, w, cx: i === 0 ? left + w / 2 : right - w / 2 };
  });
  const visibleEnds = endLabels.filter((e) => limitLabels.every((l) => e.cx + e.w / 2 + 8 < l.cx - l.w / 2 || e.cx - e.w / 2 - 8 > l.cx + l.w / 2));

  const marker = g.marker;
  const olFill = g.overRangePasses ? c.primary : c.surfaceSunken;

  return (
    <Svg width={width} height={height} aria-hidden>
      <Defs>
        <Pattern id={hatchId} patternUnits="userSpaceOnUse" width={7} height={7} patternTransform="rotate(45)">
          <Rect x={0} y={0} width={3.5} height={7} fill={c.signal} />
        </Pattern>
      </Defs>

      {/* Track and the acceptance window. */}
      <Rect x={left} y={trackTop} width={right - left} height={trackHeight} rx={4} fill={c.surfaceSunken} stroke={c.borderStrong} strokeWidth={1} />
      {g.window ? (
        <Rect x={x(g.window.from)} y={trackTop} width={Math.max(0, x(g.window.to) - x(g.window.from))} height={trackHeight} fill={c.primary} opacity={0.32} />
      ) : null}
      {g.bands.map((b) => (
        <G key={b.side}>
          <Rect x={x(b.from)} y={trackTop} width={Math.max(2, x(b.to) - x(b.from))} height={trackHeight} fill={c.signal} opacity={0.25} />
          <Rect x={x(b.from)} y={trackTop} width={Math.max(2, x(b.to) - x(b.from))} height={trackHeight} fill={`url(#${hatchId})`} opacity={0.9} />
        </G>
      ))}
      {g.limits.map((l) => (
        <Line key={l.side} x1={x(l.at)} y1={trackTop - 4} x2={x(l.at)} y2={trackBottom + 4} stroke={c.primary} strokeWidth={3} />
      ))}
      {g.ticks.map((t) => (
        <Line key={t.value} x1={x(t.at)} y1={trackBottom} x2={x(t.at)} y2={trackBottom + 6} stroke={c.borderStrong} strokeWidth={1.5} />
      ))}

      {/* Over range lives past a break in the scale. */}
      <Path d={`M${right + 2} ${trackTop + 4}l6 ${trackHeight / 2 - 4}-6 ${trackHeight / 2 - 4}`} stroke={c.borderStrong} strokeWidth={1.5} fill="none" />
      <Rect x={olLeft} y={trackTop} width={OL_ZONE} height={trackHeight} rx={4} fill={olFill} opacity={g.overRangePasses ? 0.32 : 1} stroke={c.borderStrong} strokeWidth={1} />
      {/* With an OL reading its marker takes the zone's right side and the word moves left. */}
      <SvgText x={olLeft + (marker?.kind === 'over_range' ? OL_ZONE * 0.36 : OL_ZONE / 2)} y={trackTop + trackHeight / 2 + labelSize * 0.35} fill={c.text} fontSize={labelSize} fontFamily={fonts.monoBold} textAnchor="middle">
        OL
      </SvgText>

      {limitLabels.map((l) => (
        <SvgText key={l.key} x={l.cx} y={labelY} fill={c.text} fontSize={labelSize} fontFamily={fonts.monoBold} textAnchor="middle">
          {l.text}
        </SvgText>
      ))}
      {visibleEnds.map((e) => (
        <SvgText key={e.key} x={e.cx} y={labelY} fill={c.textMuted} fontSize={labelSize - 1} fontFamily={fonts.mono} textAnchor="middle">
          {e.text}
        </SvgText>
      ))}

      {marker?.kind === 'value' ? (
        <ValueMarker x={x(marker.at)} interval={marker.interval && [x(marker.interval.from), x(marker.interval.to)]} beyond={marker.beyond} label={compact ? null : fmt(marker.value)} trackTop={trackTop} trackBottom={trackBottom} left={left} right={right} c={c} />
      ) : null}
      {marker?.kind === 'over_range' ? (
        <ValueMarker x={olLeft + OL_ZONE * 0.8} interval={null} beyond={null} label={compact ? null : 'OL'} trackTop={trackTop} trackBottom={trackBottom} left={left} right={width - PAD} c={c} />
      ) : null}
    </Svg>
  );
}

interface MarkerProps {
  x: number;
  interval: [number, number] | null;
  beyond: 'low' | 'high' | null;
  label: string | null;
  trackTop: number;
  trackBottom: number;
  left: number;
  right: number;
  c: Palette;
}

/** A pointer and a line through the track; a reading off the scale gets an arrow pointing where it went. */
function ValueMarker({ x, interval, beyond, label, trackTop, trackBottom, left, right, c }: MarkerProps) {
  const mid = (trackTop + trackBottom) / 2;
  const text = label === null ? null : beyond === 'high' ? `${label} →` : beyond === 'low' ? `← ${label}` : label;
  const labelWidth = text ? text.length * 17 * MONO_ADVANCE : 0;
  const labelX = clamp(x, left + labelWidth / 2, right - labelWidth / 2);
  return (
    <G>
      {interval ? <Rect x={interval[0]} y={mid - 3} width={Math.max(2, interval[1] - interval[0])} height={6} fill={c.text} opacity={0.55} /> : null}
      <Line x1={x} y1={trackTop - 6} x2={x} y2={trackBottom + 6} stroke={c.text} strokeWidth={3.5} />
      <Path d={`M${x - 8} ${trackTop - 14}h16l-8 10z`} fill={c.text} />
      {text ? (
        <SvgText x={labelX} y={trackTop - 19} fill={c.text} fontSize={17} fontFamily={fonts.monoBold} textAnchor="middle">
          {text}
        </SvgText>
      ) : null}
    </G>
  );
}

/** What the picture shows, for those who can't see it. */
function describe(g: SpecBarGeometry, fmt: (v: number) => string): string {
  const min = g.limits.find((l) => l.side === 'min');
  const max = g.limits.find((l) => l.side === 'max');
  const window = min && max ? `window ${fmt(min.value)} to ${fmt(max.value)}` : min ? `at least ${fmt(min.value)}` : `at most ${fmt(max!.value)}`;
  const bands = g.bands.length ? ', marginal bands either side of each limit' : '';
  const reading = !g.marker ? '' : g.marker.kind === 'over_range' ? '; reading OL (over range)' : `; reading ${fmt(g.marker.value)}`;
  return `Spec bar: ${window}${g.overRangePasses ? ', OL passes' : ''}${bands}${reading}.`;
}

interface Label {
  key: string;
  text: string;
  /** Centre and width in pixels. */
  cx: number;
  w: number;
}

/** Labels centred under their limits, pushed apart when they would touch and kept inside the track. */
function spreadLabels(labels: Label[], left: number, right: number): Label[] {
  const placed = labels.map((l) => ({ ...l }));
  if (placed.length === 2) {
    const [a, b] = placed;
    const overlap = a.cx + a.w / 2 + LABEL_GAP - (b.cx - b.w / 2);
    if (overlap > 0) {
      a.cx -= overlap / 2;
      b.cx += overlap / 2;
    }
  }
  for (const l of placed) l.cx = clamp(l.cx, left + l.w / 2, right - l.w / 2);
  return placed;
}

function clamp(v: number, lo: number, hi: number): number {
  return hi < lo ? (lo + hi) / 2 : v < lo ? lo : v > hi ? hi : v;
}

const styles = StyleSheet.create({
  wrap: { width: '100%' },
});
