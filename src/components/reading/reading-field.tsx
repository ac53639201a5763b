import { useState } from 'react';
import { StyleSheet, TextInput } from 'react-native';
import { READING_MAX } from '@shared/diagnosis/schemas';
import { Text } from '@/components/ui/text';
import { radius, space, type, useTheme } from '@/lib/theme';

interface Props {
  /** testID of the input; its label takes `<testID>-label` as its id. */
  testID: string;
  value: string;
  onChange: (text: string) => void;
  /** Enter on the keyboard: record the reading. */
  onSubmit: () => void;
  placeholder: string;
}

/** The big field a reading is typed into, as the meter shows it: on the bench and in the editor's preview alike. */
export function ReadingField({ testID, value, onChange, onSubmit, placeholder }: Props) {
  const colors = useTheme();
  const [focused, setFocused] = useState(false);
  const labelId = `${testID}-label`;
  return (
    <>
      <Text nativeID={labelId} variant="bodyStrong">
        Reading, as the meter shows it
      </Text>
      <TextInput
        testID={testID}
        aria-labelledby={labelId}
        value={value}
        onChangeText={onChange}
        inputMode="decimal"
        autoCorrect={false}
        autoCapitalize="none"
        maxLength={READING_MAX}
        placeholder={placeholder}
        placeholderTextColor={colors.textMuted}
        onFocus={() => setFocused(true)}
        onBlur={() => setFocused(false)}
        onSubmitEditing={onSubmit}
        style={[styles.reading, type.reading, { color: colors.text, backgroundColor: colors.surface, borderColor: focused ? colors.primary : colors.borderStrong, borderWidth: focused ? 3 : 2 }]}
      />
    </>
  );
}

const styles = StyleSheet.create({
  reading: { minHeight: 72, borderRadius: radius.md, paddingHorizontal: space.md },
});
