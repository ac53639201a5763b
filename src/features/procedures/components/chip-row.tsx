import { StyleSheet, View } from 'react-native';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { space } from '@/lib/theme';

/** Pick one of a few options; the chosen one is shown pressed with an outline. */
export function ChipRow<T extends string>({ label, options, value, onChange, testID }: { label: string; options: readonly { value: T; label: string }[]; value: T; onChange: (v: T) => void; testID: string }) {
  return (
    <View style={styles.wrap} role="group" aria-label={label}>
      <Text variant="label" tone="textMuted">
        {label}
      </Text>
      <View style={styles.row}>
        {options.map((o) => (
          <Button key={o.value} testID={`${testID}-${o.value || 'none'}`} label={o.label} selected={o.value === value} onPress={() => onChange(o.value)} />
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
});
