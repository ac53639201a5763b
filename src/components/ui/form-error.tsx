import { StyleSheet, View } from 'react-native';
import { Icon } from '@/components/ui/icon';
import { Text } from '@/components/ui/text';
import { radius, space, useTheme } from '@/lib/theme';

/** A banner for what went wrong with a form as a whole, said in words. */
export function FormError({ message, testID = 'form-error' }: { message: string | null | undefined; testID?: string }) {
  const colors = useTheme();
  if (!message) return null;
  return (
    <View
      testID={testID}
      role="alert"
      style={[styles.banner, { backgroundColor: colors.dangerSoft, borderLeftColor: colors.danger }]}
    >
      <Icon name="alert" color={colors.danger} />
      <Text style={styles.message}>{message}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  banner: {
    flexDirection: 'row',
    alignItems: 'flex-start',
    gap: space.md,
    borderLeftWidth: 5,
    borderRadius: radius.md,
    padding: space.md,
  },
  message: { flex: 1 },
});
