import { useState } from 'react';
import { StyleSheet, TextInput, View } from 'react-native';
import { Text } from '@/components/ui/text';
import { radius, space, type, useTheme } from '@/lib/theme';

/** The technician's note on a step: what they saw, what they did first. */
export function NoteField({ value, onChange }: { value: string; onChange: (text: string) => void }) {
  const colors = useTheme();
  const [focused, setFocused] = useState(false);
  return (
    <View style={styles.field}>
      <Text nativeID="step-note-label" variant="bodyStrong">
        Note for this step <Text tone="textMuted">(optional)</Text>
      </Text>
      <TextInput
        testID="step-note"
        aria-labelledby="step-note-label"
        value={value}
        onChangeText={onChange}
        multiline
        maxLength={2000}
        placeholder="What you saw, what you cleaned or re-seated first…"
        placeholderTextColor={colors.textMuted}
        onFocus={() => setFocused(true)}
        onBlur={() => setFocused(false)}
        style={[
          styles.input,
          type.body,
          { color: colors.text, backgroundColor: colors.surface, borderColor: focused ? colors.primary : colors.borderStrong, borderWidth: focused ? 2 : 1 },
        ]}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: space.xs },
  input: { minHeight: 76, borderRadius: radius.md, paddingHorizontal: space.md, paddingVertical: space.sm, textAlignVertical: 'top' },
});
