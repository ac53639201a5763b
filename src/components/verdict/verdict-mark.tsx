import { StyleSheet, View } from 'react-native';
import Svg, { Path } from 'react-native-svg';
import { VERDICT_WORDS } from '@shared/diagnosis/verdict-words';
import type { Verdict } from '@shared/engine/verdict';
import { Text } from '@/components/ui/text';
import { type Palette, radius, space, useTheme } from '@/lib/theme';

/**
 * Each verdict has its own shape as well as its word, so it never rests on colour alone: a ticked disc,
 * a triangle pointing down (low) or up (high), a broken line (open), a diamond with a wave (marginal), a
 * dashed ring (no reading). Solid shapes, so none is mistaken for an outlined caution or alert icon; the
 * report's PDF draws the same paths.
 */
const SHAPES: Record<Verdict, { fill?: string; stroke: string[] }> = {
  in_spec: { fill: 'M21.5 12a9.5 9.5 0 1 1-19 0a9.5 9.5 0 1 1 19 0z', stroke: ['M7.5 12.5l3 3 6-6.5'] },
  low: { fill: 'M3 6.5h18L12 20z', stroke: [] },
  high: { fill: 'M3 17.5h18L12 4z', stroke: [] },
  open: { stroke: ['M2 12h6M16 12h6M8 12l7-5.5'] },
  marginal: { fill: 'M12 2l10 10-10 10L2 12z', stroke: ['M7.5 12.5c1.5-2 3-2 4.5 0s3 2 4.5 0'] },
  no_reading: { stroke: ['M21.5 12a9.5 9.5 0 1 1-19 0a9.5 9.5 0 1 1 19 0z', 'M7.5 12h9'] },
};

/** A verdict's shape in its colour; lines over a solid shape are cut out in the tint behind it. */
function VerdictShape({ verdict, size = 24 }: { verdict: Verdict; size?: number }) {
  const c = useTheme();
  const t = tint(verdict, c);
  const shape = SHAPES[verdict];
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" aria-hidden>
      {shape.fill ? <Path d={shape.fill} fill={t.ink} /> : null}
      {shape.stroke.map((d) => (
        <Path key={d} d={d} fill="none" stroke={shape.fill ? t.soft : t.ink} strokeWidth={2.4} strokeLinecap="round" strokeLinejoin="round" />
      ))}
    </Svg>
  );
}

function tint(verdict: Verdict, c: Palette) {
  switch (verdict) {
    case 'in_spec':
      return { ink: c.success, soft: c.successSoft };
    case 'marginal':
      return { ink: c.warning, soft: c.warningSoft };
    case 'no_reading':
      return { ink: c.textMuted, soft: c.surfaceSunken };
    default:
      return { ink: c.danger, soft: c.dangerSoft };
  }
}

/** A verdict as a compact chip: shape and word. */
export function VerdictChip({ verdict, testID }: { verdict: Verdict; testID?: string }) {
  const c = useTheme();
  const t = tint(verdict, c);
  return (
    <View testID={testID} style={[styles.chip, { backgroundColor: t.soft, borderColor: t.ink }]}>
      <VerdictShape verdict={verdict} size={18} />
      <Text variant="label" style={{ color: c.text }}>
        {VERDICT_WORDS[verdict]}
      </Text>
    </View>
  );
}

/** The verdict on one line, for a bar of actions: shape, word, and where it leads. */
export function VerdictLine({ verdict, detail, testID = 'verdict-line' }: { verdict: Verdict; detail?: string; testID?: string }) {
  const c = useTheme();
  const t = tint(verdict, c);
  return (
    <View testID={testID} style={[styles.line, { backgroundColor: t.soft, borderLeftColor: t.ink }]}>
      <VerdictShape verdict={verdict} size={24} />
      <Text variant="bodyStrong">{VERDICT_WORDS[verdict]}</Text>
      {detail ? (
        <Text variant="small" tone="textMuted" numberOfLines={1} style={styles.lineDetail}>
          {detail}
        </Text>
      ) : null}
    </View>
  );
}

/**
 * The verdict as soon as a reading parses: a large shape, the word, and what it means in a sentence.
 * Announced politely to screen readers as it changes.
 */
export function VerdictPanel({ verdict, explanation, next, testID = 'verdict' }: { verdict: Verdict; explanation: string; next?: string; testID?: string }) {
  const c = useTheme();
  const t = tint(verdict, c);
  return (
    <View testID={testID} role="status" aria-live="polite" style={[styles.panel, { backgroundColor: t.soft, borderLeftColor: t.ink }]}>
      <VerdictShape verdict={verdict} size={36} />
      <View style={styles.words}>
        <Text testID={`${testID}-word`} variant="title">
          {VERDICT_WORDS[verdict]}
        </Text>
        <Text>{explanation}</Text>
        {next ? (
          <Text variant="small" tone="textMuted">
            {next}
          </Text>
        ) : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  chip: {
    flexDirection: 'row',
    alignItems: 'center',
    alignSelf: 'flex-start',
    gap: space.xs,
    borderWidth: 1.5,
    borderRadius: radius.pill,
    paddingHorizontal: space.sm,
    paddingVertical: 2,
  },
  panel: { flexDirection: 'row', alignItems: 'flex-start', gap: space.md, borderLeftWidth: 6, borderRadius: radius.md, padding: space.md },
  words: { flex: 1, gap: space.xs },
  line: { flexDirection: 'row', alignItems: 'center', gap: space.sm, borderLeftWidth: 6, borderRadius: radius.sm, paddingHorizontal: space.sm, paddingVertical: space.xs },
  lineDetail: { flex: 1 },
});
