import { StyleSheet, View } from 'react-native';
import { Button } from '@/components/ui/button';
import { Icon } from '@/components/ui/icon';
import { Text } from '@/components/ui/text';
import { layout, space, useTheme } from '@/lib/theme';

/** Above every page while the session check can't reach the server: the shop stays open from this device. */
export function OfflineBanner({ onRetry }: { onRetry: () => void }) {
  const colors = useTheme();
  return (
    <View testID="session-offline" role="status" style={[styles.bar, { backgroundColor: colors.warningSoft, borderBottomColor: colors.warning }]}>
      <Icon name="unplugged" color={colors.warning} />
      <Text variant="small" style={styles.message}>
        Can't reach Probepath. Work carries on from this device.
      </Text>
      <Button testID="session-retry" label="Try again" variant="quiet" onPress={onRetry} style={{ minHeight: layout.primaryTouch }} />
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { flexDirection: 'row', alignItems: 'center', gap: space.md, paddingLeft: space.lg, paddingRight: space.xs, paddingVertical: space.xs, borderBottomWidth: 2 },
  message: { flex: 1 },
});
