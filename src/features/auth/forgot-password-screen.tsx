import { useRouter } from 'expo-router';
import { Formik } from 'formik';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { forgotPasswordSchema } from '@shared/auth/schemas';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { AuthFrame } from '@/features/auth/components/auth-frame';
import { useForgotPassword } from '@/hooks/use-auth';
import { showServerError } from '@/lib/form-errors';
import { space } from '@/lib/theme';

export function ForgotPasswordScreen() {
  const router = useRouter();
  const forgot = useForgotPassword();
  const [sentTo, setSentTo] = useState<string | null>(null);

  return (
    <AuthFrame
      testID="forgot-password-screen"
      title="Forgot your password?"
      intro="We'll e-mail you a link to choose a new one."
    >
      {sentTo ? (
        <View style={styles.form} role="status" testID="forgot-password-sent">
          <Text>
            If {sentTo} belongs to a Probepath member, a link to choose a new password is on its way.
          </Text>
          <Text tone="textMuted">No mail after a few minutes? Ask your shop owner: they can read the shop&apos;s sent mail in the Outbox.</Text>
          <Button testID="forgot-password-back" label="Back to sign in" variant="primary" onPress={() => router.replace('/sign-in')} />
        </View>
      ) : (
        <Formik
          initialValues={{ email: '' }}
          validationSchema={forgotPasswordSchema}
          onSubmit={async (values, helpers) => {
            helpers.setStatus(undefined);
            const input = forgotPasswordSchema.cast(values);
            try {
              await forgot.trigger(input);
              setSentTo(input.email);
            } catch (error) {
              showServerError(error, helpers);
            }
          }}
        >
          {({ handleSubmit, isSubmitting, status }) => (
            <View style={styles.form}>
              <FormError message={status} />
              <TextField
                name="email"
                label="E-mail"
                testID="forgot-password-email"
                autoComplete="email"
                keyboardType="email-address"
                inputMode="email"
              />
              <Button
                testID="forgot-password-submit"
                label="Send the link"
                variant="primary"
                loading={isSubmitting}
                onPress={() => handleSubmit()}
              />
              <Button testID="forgot-password-cancel" label="Back to sign in" variant="quiet" onPress={() => router.replace('/sign-in')} />
            </View>
          )}
        </Formik>
      )}
    </AuthFrame>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
});
