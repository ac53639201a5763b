import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import Svg, { Circle, Path } from 'react-native-svg';
import { VERDICT_WORDS } from '@shared/diagnosis/verdict-words';
import type { Verdict } from '@shared/engine/verdict';
import { Text } from '@/components/ui/text';
import { type Palette, radius, space, useTheme } from '@/lib/theme';

/** A shape for each verdict, so it is never told by colour alone: tick, arrows, broken line, waves, dash. */
const SHAPES: Record<Verdict, ReactNode> = {
  in_spec: (
    <>
      <Circle cx={12} cy={12} r={9} />
      <Path d="M7.5 12.5l3 3 6-6.5" />
    </>
  ),
  low: <Path d="M12 4v15M5.5 12.5L12 19l6.5-6.5" />,
  high: <Path d="M12 20V5M5.5 11.5L12 5l6.5 6.5" />,
  open: <Path d="M2.5 15h5.5M16 15h5.5M8 15l7.5-7M16 13v4" />,
  marginal: <Path d="M3.5 9.5c2.8-2.6 5.7-2.6 8.5 0s5.7 2.6 8.5 0M3.5 15.5c2.8-2.6 5.7-2.6 8.5 0s5.7 2.6 8.5 0" />,
  no_reading: (
    <>
      <Circle cx={12} cy={12} r={9} />
      <Path d="M7.5 12h9" />
    </>
  ),
};

export function verdictTone(c: Palette, verdict: Verdict): { ink: string; soft: string } {
  if (verdict === 'in_spec') return { ink: c.success, soft: c.successSoft };
  if (verdict === 'marginal') return { ink: c.warning, soft: c.warningSoft };
  if (verdict === 'no_reading') return { ink: c.textMuted, soft: c.surfaceSunken };
  return { ink: c.danger, soft: c.dangerSoft };
}

export function VerdictIcon({ verdict, size = 24, color }: { verdict: Verdict; size?: number; color: string }) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" fill="none" stroke={color} strokeWidth={2.4} strokeLinecap="round" strokeLinejoin="round" aria-hidden>
      {SHAPES[verdict]}
    </Svg>
  );
}

/**
 * The verdict in words with its shape, on a tint of its colour. The word is in the body text colour so it
 * reads at 7:1 whatever the tint; the colour only repeats what the word and shape say.
 */
export function VerdictBadge({ verdict, size = 'normal', testID }: { verdict: Verdict; size?: 'normal' | 'large'; testID?: string }) {
  const c = useTheme();
  const tone = verdictTone(c, verdict);
  const large = size === 'large';
  return (
    <View testID={testID} style={[styles.badge, large && styles.large, { backgroundColor: tone.soft, borderColor: tone.ink }]}>
      <VerdictIcon verdict={verdict} size={large ? 30 : 20} color={tone.ink} />
      <Text variant={large ? 'title' : 'bodyStrong'}>{VERDICT_WORDS[verdict]}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  badge: {
    flexDirection: 'row',
    alignItems: 'center',
    alignSelf: 'flex-start',
    gap: space.sm,
    borderRadius: radius.pill,
    borderWidth: 2,
    paddingHorizontal: space.md,
    paddingVertical: space.xs,
  },
  large: { paddingHorizontal: space.lg, paddingVertical: space.sm, gap: space.md },
});
