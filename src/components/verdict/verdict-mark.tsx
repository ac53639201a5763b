import { StyleSheet, View } from 'react-native';
import { VERDICT_WORDS } from '@shared/diagnosis/verdict-words';
import type { Verdict } from '@shared/engine/verdict';
import { Icon, type IconName } from '@/components/ui/icon';
import { Text } from '@/components/ui/text';
import { type Palette, radius, space, useTheme } from '@/lib/theme';

/** Each verdict has its own shape as well as its word, so it never rests on colour alone. */
const SHAPES: Record<Verdict, IconName> = {
  in_spec: 'verdictInSpec',
  low: 'verdictLow',
  high: 'verdictHigh',
  open: 'verdictOpen',
  marginal: 'verdictMarginal',
  no_reading: 'verdictNone',
};

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
      <Icon name={SHAPES[verdict]} size={18} color={t.ink} />
      <Text variant="label" style={{ color: c.text }}>
        {VERDICT_WORDS[verdict]}
      </Text>
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
      <Icon name={SHAPES[verdict]} size={36} color={t.ink} />
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
});
