import { StyleSheet, View } from 'react-native';
import Svg, { Circle } from 'react-native-svg';
import { Button, type ButtonProps } from '@/components/ui/button';
import { Icon, type IconName } from '@/components/ui/icon';
import { Heading, Text } from '@/components/ui/text';
import { space, useTheme } from '@/lib/theme';

interface EmptyStateProps {
  icon: IconName;
  title: string;
  /** What will appear here and how to get it. */
  body: string;
  action?: Pick<ButtonProps, 'label' | 'onPress' | 'testID' | 'variant'>;
  testID?: string;
}

/** The designed picture of a place with nothing in it yet, and the way to fill it. */
export function EmptyState({ icon, title, body, action, testID = 'empty-state' }: EmptyStateProps) {
  const colors = useTheme();
  return (
    <View testID={testID} style={styles.wrap}>
      <View style={styles.art}>
        <Svg width={132} height={132} viewBox="0 0 132 132" aria-hidden style={StyleSheet.absoluteFill}>
          <Circle cx={66} cy={66} r={56} fill={colors.primarySoft} />
          <Circle cx={66} cy={66} r={63} fill="none" stroke={colors.borderStrong} strokeWidth={2} strokeDasharray="4 7" />
          <Circle cx={113} cy={34} r={7} fill={colors.signal} />
        </Svg>
        {/* Its own View so it paints above the absolutely placed backdrop. */}
        <View>
          <Icon name={icon} size={56} color={colors.primary} />
        </View>
      </View>
      <Heading level={2} style={styles.center}>
        {title}
      </Heading>
      <Text tone="textMuted" style={[styles.center, styles.body]}>
        {body}
      </Text>
      {action ? <Button variant="primary" {...action} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { alignItems: 'center', gap: space.lg, paddingVertical: space.xxl, paddingHorizontal: space.lg },
  art: { width: 132, height: 132, alignItems: 'center', justifyContent: 'center' },
  center: { textAlign: 'center' },
  body: { maxWidth: 460 },
});
