import { useField, useFormikContext } from 'formik';
import { useState } from 'react';
import { StyleSheet, TextInput, type TextInputProps, View } from 'react-native';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { radius, space, type, useTheme } from '@/lib/theme';

interface TextFieldProps
  extends Pick<TextInputProps, 'autoComplete' | 'keyboardType' | 'textContentType' | 'autoFocus' | 'inputMode' | 'multiline'> {
  /** The formik field this input edits. */
  name: string;
  label: string;
  hint?: string;
  secret?: boolean;
  testID: string;
}

/** A labelled input bound to the surrounding Formik form; Enter submits it (a multiline one takes Enter as a new line). */
export function TextField({ name, label, hint, secret = false, testID, ...inputProps }: TextFieldProps) {
  const colors = useTheme();
  const [field, meta, helpers] = useField<string>(name);
  const { submitForm } = useFormikContext();
  const [revealed, setRevealed] = useState(false);
  const [focused, setFocused] = useState(false);
  const error = meta.touched ? meta.error : undefined;
  const ids = { label: `${testID}-label`, note: `${testID}-note` };

  return (
    <View style={styles.field}>
      <Text nativeID={ids.label} variant="bodyStrong">
        {label}
      </Text>
      {hint ? <Text variant="small" tone="textMuted">{hint}</Text> : null}
      <View style={styles.row}>
        <TextInput
          testID={testID}
          aria-labelledby={ids.label}
          aria-invalid={Boolean(error)}
          aria-describedby={error ? ids.note : undefined}
          value={field.value}
          onChangeText={helpers.setValue}
          onFocus={() => setFocused(true)}
          onBlur={() => {
            setFocused(false);
            void helpers.setTouched(true);
          }}
          onSubmitEditing={inputProps.multiline ? undefined : () => void submitForm()}
          secureTextEntry={secret && !revealed}
          autoCapitalize="none"
          autoCorrect={false}
          placeholderTextColor={colors.textMuted}
          style={[
            styles.input,
            inputProps.multiline ? styles.multiline : null,
            type.body,
            {
              color: colors.text,
              backgroundColor: colors.surface,
              borderColor: error ? colors.danger : focused ? colors.primary : colors.borderStrong,
              borderWidth: error || focused ? 2 : 1,
            },
          ]}
          {...inputProps}
        />
        {secret ? (
          <Button
            testID={`${testID}-reveal`}
            label={revealed ? 'Hide' : 'Show'}
            variant="quiet"
            onPress={() => setRevealed((r) => !r)}
          />
        ) : null}
      </View>
      {error ? (
        <Text nativeID={ids.note} variant="small" tone="danger">
          {error}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: space.xs },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  input: { flex: 1, minHeight: 52, borderRadius: radius.md, paddingHorizontal: space.md, paddingVertical: space.sm },
  multiline: { minHeight: 96, textAlignVertical: 'top' },
});
