import { useState } from 'react';
import { StyleSheet, TextInput, View } from 'react-native';
import { Text } from '@/components/ui/text';
import { radius, space, type, useTheme } from '@/lib/theme';

interface SearchFieldProps {
  label: string;
  value: string;
  onChange: (text: string) => void;
  placeholder?: string;
  testID: string;
  /** Called on Enter, for a field whose value is acted on rather than only narrowing a list. */
  onSubmit?: () => void;
}

/** A labelled text input outside any form that narrows a list as you type: searches and filters. */
export function SearchField({ label, value, onChange, placeholder, testID, onSubmit }: SearchFieldProps) {
  const colors = useTheme();
  const [focused, setFocused] = useState(false);
  return (
    <View style={styles.field}>
      <Text nativeID={`${testID}-label`} variant="bodyStrong">
        {label}
      </Text>
      <TextInput
        testID={testID}
        aria-labelledby={`${testID}-label`}
        role="searchbox"
        value={value}
        onChangeText={onChange}
        onSubmitEditing={onSubmit}
        placeholder={placeholder}
        placeholderTextColor={colors.textMuted}
        autoCorrect={false}
        autoCapitalize="none"
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
  input: { minHeight: 52, borderRadius: radius.md, paddingHorizontal: space.md },
});
