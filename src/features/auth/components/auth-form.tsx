import { Formik, type FormikValues } from 'formik';
import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import type { ObjectSchema } from 'yup';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { showServerError } from '@/lib/form-errors';
import { space } from '@/lib/theme';

interface Props<T extends FormikValues> {
  initialValues: T;
  /** The shared schema the server validates with too; values are cast through it before `onSubmit`. */
  schema: ObjectSchema<T>;
  /** Sends the cast values; a thrown API error lands on the form (field messages and the server's sentence). */
  onSubmit: (values: T) => Promise<unknown>;
  /** Called with the error after it is shown, for screens that react to a particular code. */
  onError?: (error: unknown) => void;
  submitLabel: string;
  submitTestID: string;
  /** The fields, between the form's error line and its submit button. */
  children: ReactNode;
  /** Shown under the error line, above the fields (e.g. a way out when a link is spent). */
  notice?: ReactNode;
  /** Shown under the submit button (e.g. a quiet way back). */
  footer?: ReactNode;
}

/** The one shape of every sign-in-side form: error line, fields, a primary submit, an optional way back. */
export function AuthForm<T extends FormikValues>({ initialValues, schema, onSubmit, onError, submitLabel, submitTestID, children, notice, footer }: Props<T>) {
  return (
    <Formik<T>
      initialValues={initialValues}
      validationSchema={schema}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        try {
          await onSubmit(schema.cast(values) as T);
        } catch (error) {
          showServerError(error, helpers);
          onError?.(error);
        }
      }}
    >
      {({ handleSubmit, isSubmitting, status }) => (
        <View style={styles.form}>
          <FormError message={status} />
          {notice}
          {children}
          <Button testID={submitTestID} label={submitLabel} variant="primary" loading={isSubmitting} onPress={() => handleSubmit()} />
          {footer}
        </View>
      )}
    </Formik>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
});
