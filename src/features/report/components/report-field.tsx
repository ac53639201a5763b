import { StyleSheet, View } from 'react-native';
import { Text } from '@/components/ui/text';

/** A small label over its value; nothing at all when there is no value. */
export function ReportField({ label, value, mono = false, testID }: { label: string; value: string | null | undefined; mono?: boolean; testID?: string }) {
  if (!value) return null;
  return (
    <View style={styles.field} testID={testID} role="group" aria-label={label}>
      <Text variant="label" tone="textMuted" style={styles.label}>
        {label}
      </Text>
      <Text variant={mono ? 'mono' : 'body'}>{value}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: 2 },
  label: { textTransform: 'uppercase', letterSpacing: 0.6 },
});
