import { Formik } from 'formik';
import { StyleSheet, View } from 'react-native';
import { mutate } from 'swr';
import { concludeSchema } from '@shared/diagnosis/schemas';
import type { FindingCheck } from '@shared/engine/procedure';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { FormError } from '@/components/ui/form-error';
import { Heading, Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { DIAGNOSIS_LISTS, useConcludeDiagnosis } from '@/hooks/use-diagnosis';
import { showServerError } from '@/lib/form-errors';
import { useRequestKey } from '@/lib/idempotency-key';
import { space } from '@/lib/theme';
import { BackButton } from './back-button';
import { CheckDetails } from './check-details';
import { StepFrame } from './step-frame';
import { StepsWaiting } from './steps-waiting';
import type { StepProps } from './step-props';

/** The path reached a finding: the faulty part and the action, then parts, labour and a closing note to conclude. */
export function FindingStep({ detail, local, check, number, onBack, status, footer }: StepProps<FindingCheck>) {
  const conclude = useConcludeDiagnosis(detail.id);
  const requestKey = useRequestKey();
  const waiting = local.pendingCount;

  return (
    <Formik
      initialValues={{ parts: '', labourMinutes: '', note: '' }}
      validationSchema={concludeSchema}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(null);
        const input = concludeSchema.cast({ ...values, labourMinutes: values.labourMinutes.trim() === '' ? null : values.labourMinutes });
        try {
          await conclude.trigger({ input, key: requestKey(input) });
          void mutate(DIAGNOSIS_LISTS);
        } catch (error) {
          showServerError(error, helpers);
        }
      }}
    >
      {({ submitForm, isSubmitting, status: formStatus }) => (
        <StepFrame
          testID="finding-step"
          actions={
            <View style={styles.actions}>
              <BackButton onBack={onBack} />
              <Button testID="conclude" variant="primary" icon="check" label="Conclude diagnosis" loading={isSubmitting} disabled={waiting > 0} onPress={() => void submitForm()} style={styles.grow} />
            </View>
          }
        >
          {status}
          <CheckDetails check={check} number={number} />
          <Card testID="finding">
            <Text variant="label" tone="textMuted">
              FAULTY PART OR CAUSE
            </Text>
            <Heading level={2}>{check.finding.part}</Heading>
            <Text variant="label" tone="textMuted">
              RECOMMENDED ACTION
            </Text>
            <Text>{check.finding.action}</Text>
          </Card>
          <StepsWaiting count={waiting} closing="concluded" testID="conclude-waiting" />
          <FormError message={formStatus} />
          <View style={styles.fields}>
            <TextField name="parts" label="Parts used" hint="Optional, e.g. pulse coil, connector pigtail" testID="conclude-parts" />
            <TextField name="labourMinutes" label="Labour, minutes" hint="Optional; the time spent on the diagnosis and repair" testID="conclude-labour" inputMode="numeric" />
            <TextField name="note" label="Closing note" hint="What you repaired and how you proved the fix" testID="conclude-note" multiline />
          </View>
          {footer}
        </StepFrame>
      )}
    </Formik>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', gap: space.md },
  grow: { flexGrow: 1 },
  fields: { gap: space.md },
});
