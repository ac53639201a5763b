import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { Text } from '@/components/ui/text';
import { space, useTheme } from '@/lib/theme';

/** A spinner that says what it is waiting for. */
export function LoadingState({ label, testID = 'loading-state' }: { label: string; testID?: string }) {
  const colors = useTheme();
  return (
    <View testID={testID} role="status" aria-live="polite" style={styles.wrap}>
      <ActivityIndicator size="large" color={colors.primary} />
      <Text tone="textMuted">{label}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { flexGrow: 1, alignItems: 'center', justifyContent: 'center', gap: space.md, padding: space.xxl },
});
