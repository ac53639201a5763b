import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { TaskCheck } from '@shared/engine/procedure';
import { Button } from '@/components/ui/button';
import { space } from '@/lib/theme';
import { BackButton } from './back-button';
import { CheckDetails } from './check-details';
import { NoteField } from './note-field';
import { StepFrame } from './step-frame';
import type { StepProps } from './step-props';

/** A task: do it, say what you did if it matters, then one "Done". */
export function TaskStep({ check, number, onRecord, onBack, status, footer }: StepProps<TaskCheck>) {
  const [note, setNote] = useState('');
  return (
    <StepFrame
      testID="task-step"
      actions={
        <View style={styles.actions}>
          <BackButton onBack={onBack} />
          <Button testID="task-done" variant="primary" icon="check" label="Done" onPress={() => onRecord({ checkId: check.id, note: note.trim() })} style={styles.grow} />
        </View>
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
  actions: { flexDirection: 'row', gap: space.md },
  grow: { flexGrow: 1 },
});
