import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { ObserveCheck } from '@shared/engine/procedure';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { space } from '@/lib/theme';
import { BackButton } from './back-button';
import { CheckDetails } from './check-details';
import { NoteField } from './note-field';
import { StepFrame } from './step-frame';
import type { StepProps } from './step-props';

/** An observe check: each stated observation is one large button, in thumb reach; a tap records it. */
export function ObserveStep({ check, number, onRecord, onBack, status, footer }: StepProps<ObserveCheck>) {
  const [note, setNote] = useState('');
  return (
    <StepFrame
      testID="observe-step"
      actions={
        <>
          <Text nativeID="choices-label" variant="label" tone="textMuted">
            WHAT DID YOU SEE?
          </Text>
          <View role="group" aria-labelledby="choices-label" style={styles.choices}>
            {check.choices.map((c) => (
              <Button key={c.id} testID={`choice-${c.id}`} variant="secondary" label={c.label} onPress={() => onRecord({ checkId: check.id, choiceId: c.id, note: note.trim() })} style={styles.choice} />
            ))}
          </View>
          <BackButton onBack={onBack} />
        </>
      }
    >
      {status}
      <CheckDetails check={check} number={number} />
      <NoteField value={note} onChange={setNote} />
      {footer}
    </StepFrame>
  );
}

const styles = StyleSheet.create({
  choices: { gap: space.sm },
  choice: { minHeight: 60, justifyContent: 'flex-start' },
});
