import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { forgotPasswordSchema } from '@shared/auth/schemas';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { AuthForm } from '@/features/auth/components/auth-form';
import { AuthFrame } from '@/features/auth/components/auth-frame';
import { useForgotPassword } from '@/hooks/use-auth';
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
        <AuthForm
          initialValues={{ email: '' }}
          schema={forgotPasswordSchema}
          onSubmit={async (values) => {
            await forgot.trigger(values);
            setSentTo(values.email);
          }}
          submitLabel="Send the link"
          submitTestID="forgot-password-submit"
          footer={<Button testID="forgot-password-cancel" label="Back to sign in" variant="quiet" onPress={() => router.replace('/sign-in')} />}
        >
          <TextField name="email" label="E-mail" testID="forgot-password-email" autoComplete="email" keyboardType="email-address" inputMode="email" />
        </AuthForm>
      )}
    </AuthFrame>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
});
