import { StyleSheet, View } from 'react-native';
import { Icon, type IconName } from '@/components/ui/icon';
import { Text } from '@/components/ui/text';
import { radius, space, useTheme } from '@/lib/theme';

type BadgeTone = 'neutral' | 'success' | 'warning' | 'danger' | 'primary';

/** A short status word on a tinted chip; an optional icon keeps it from being colour-only. */
export function Badge({ label, tone = 'neutral', icon }: { label: string; tone?: BadgeTone; icon?: IconName }) {
  const c = useTheme();
  const tint = {
    neutral: { bg: c.surfaceSunken, fg: c.text },
    success: { bg: c.successSoft, fg: c.success },
    warning: { bg: c.warningSoft, fg: c.warning },
    danger: { bg: c.dangerSoft, fg: c.danger },
    primary: { bg: c.primarySoft, fg: c.primary },
  }[tone];
  return (
    <View style={[styles.badge, { backgroundColor: tint.bg }]}>
      {icon ? <Icon name={icon} size={16} color={tint.fg} /> : null}
      <Text variant="label" style={{ color: tint.fg }}>
        {label}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  badge: {
    flexDirection: 'row',
    alignItems: 'center',
    alignSelf: 'flex-start',
    gap: space.xs,
    borderRadius: radius.pill,
    paddingHorizontal: space.md,
    paddingVertical: space.xs,
  },
});
