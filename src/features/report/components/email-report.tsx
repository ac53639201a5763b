import { Formik } from 'formik';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { emailReportSchema } from '@shared/report/schemas';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { api } from '@/lib/api';
import { showServerError } from '@/lib/form-errors';
import { formatDateTime } from '@/lib/format';
import { useRequestKey } from '@/lib/idempotency-key';
import { radius, space, useTheme } from '@/lib/theme';

interface Sent {
  to: string;
  subject: string;
  filename: string;
  sentAt: string;
}

/**
 * "E-mail to customer": the address comes from the job and can be changed. The
 * same address sent again after a lost answer reuses its Idempotency-Key, so
 * the customer gets one message.
 */
export function EmailReport({ diagnosisId, customerEmail }: { diagnosisId: string; customerEmail: string }) {
  const colors = useTheme();
  const [open, setOpen] = useState(false);
  const [sent, setSent] = useState<Sent | null>(null);
  const keyFor = useRequestKey();

  if (!open) {
    return <Button testID="report-email" label="E-mail to customer" icon="outbox" onPress={() => setOpen(true)} />;
  }
  return (
    <View style={[styles.panel, { borderColor: colors.border, backgroundColor: colors.surface }]} testID="report-email-panel">
      <Formik
        initialValues={{ to: customerEmail }}
        validationSchema={emailReportSchema}
        onSubmit={async (values, helpers) => {
          helpers.setStatus(undefined);
          setSent(null);
          const body = emailReportSchema.cast(values);
          try {
            const answer = await api<{ sent: Sent }>(`/api/diagnoses/${diagnosisId}/report/email`, 'POST', body, { idempotencyKey: keyFor(body) });
            setSent(answer.sent);
          } catch (error) {
            showServerError(error, helpers);
          }
        }}
      >
        {({ handleSubmit, isSubmitting, status }) => (
          <View style={styles.form}>
            <TextField name="to" label="Send the report to" hint="The PDF goes as an attachment." testID="report-email-to" keyboardType="email-address" inputMode="email" autoComplete="email" />
            <FormError message={status} testID="report-email-error" />
            {sent ? (
              <Text role="status" tone="success" testID="report-email-sent">
                Sent to {sent.to} at {formatDateTime(sent.sentAt)}, with {sent.filename} attached.
              </Text>
            ) : null}
            <View style={styles.buttons}>
              <Button testID="report-email-send" label="Send report" variant="primary" loading={isSubmitting} onPress={() => handleSubmit()} />
              <Button testID="report-email-cancel" label="Close" variant="quiet" onPress={() => setOpen(false)} />
            </View>
          </View>
        )}
      </Formik>
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { borderWidth: 1, borderRadius: radius.lg, padding: space.lg, width: '100%', maxWidth: 520 },
  form: { gap: space.md },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
