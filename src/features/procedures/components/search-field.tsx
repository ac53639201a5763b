import { StyleSheet, TextInput, View } from 'react-native';
import { Text } from '@/components/ui/text';
import { radius, space, type, useTheme } from '@/lib/theme';

/** A labelled text input outside any form: search boxes, filters, typed readings in the preview. */
export function PlainField({ label, value, onChange, placeholder, testID, onSubmit }: { label: string; value: string; onChange: (v: string) => void; placeholder?: string; testID: string; onSubmit?: () => void }) {
  const colors = useTheme();
  return (
    <View style={styles.field}>
      <Text nativeID={`${testID}-label`} variant="label" tone="textMuted">
        {label}
      </Text>
      <TextInput
        testID={testID}
        aria-labelledby={`${testID}-label`}
        value={value}
        onChangeText={onChange}
        onSubmitEditing={onSubmit}
        placeholder={placeholder}
        placeholderTextColor={colors.textMuted}
        autoCapitalize="none"
        autoCorrect={false}
        style={[styles.input, type.body, { color: colors.text, backgroundColor: colors.surface, borderColor: colors.borderStrong }]}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: space.xs, flexGrow: 1 },
  input: { minHeight: 48, borderWidth: 1, borderRadius: radius.md, paddingHorizontal: space.md },
});
