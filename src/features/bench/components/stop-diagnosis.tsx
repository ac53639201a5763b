import { Formik } from 'formik';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { mutate } from 'swr';
import { abandonSchema } from '@shared/diagnosis/schemas';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { Heading, Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { DIAGNOSIS_LISTS, useAbandonDiagnosis } from '@/hooks/use-diagnosis';
import { showServerError } from '@/lib/form-errors';
import { useRequestKey } from '@/lib/idempotency-key';
import { StepsWaiting } from './steps-waiting';
import { space } from '@/lib/theme';

/**
 * Stopping an open diagnosis without a finding (the customer takes the machine away, a part has to be
 * ordered first…), with the reason. Kept in the path panel, away from the check's own buttons, and behind
 * a second press. The steps recorded so far stay in the shop's records.
 */
export function StopDiagnosis({ diagnosisId, waiting }: { diagnosisId: string; waiting: number }) {
  const [open, setOpen] = useState(false);
  const abandon = useAbandonDiagnosis(diagnosisId);
  const requestKey = useRequestKey();

  if (!open) {
    return (
      <Button testID="stop-diagnosis" label="Stop without a finding…" onPress={() => setOpen(true)} style={styles.start} />
    );
  }
  return (
    <Formik
      initialValues={{ reason: '' }}
      validationSchema={abandonSchema}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        const input = abandonSchema.cast(values);
        try {
          await abandon.trigger({ input, key: requestKey(input) });
          void mutate(DIAGNOSIS_LISTS);
        } catch (error) {
          showServerError(error, helpers);
        }
      }}
    >
      {({ submitForm, isSubmitting, status }) => (
        <View style={styles.box} role="group" aria-label="Stop this diagnosis" testID="stop-diagnosis-form">
          <Heading level={3}>Stop this diagnosis?</Heading>
          <Text tone="textMuted">
            It closes without a finding and takes no more steps. The steps recorded so far stay in the shop&apos;s records and on the report.
          </Text>
          <StepsWaiting count={waiting} closing="stopped" testID="stop-waiting" />
          <FormError message={status} />
          <TextField name="reason" label="Why it stops here" hint="e.g. customer collected the machine; waiting for a part" testID="stop-reason" multiline />
          <View style={styles.actions}>
            <Button testID="stop-cancel" label="Keep going" onPress={() => setOpen(false)} />
            <Button testID="stop-confirm" label="Stop diagnosis" variant="danger" loading={isSubmitting} disabled={waiting > 0} onPress={() => void submitForm()} />
          </View>
        </View>
      )}
    </Formik>
  );
}

const styles = StyleSheet.create({
  start: { alignSelf: 'flex-start' },
  box: { gap: space.md },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
