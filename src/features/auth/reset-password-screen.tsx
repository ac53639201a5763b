import { useLocalSearchParams, useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { PASSWORD_MIN, resetPasswordSchema } from '@shared/auth/schemas';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { AuthForm } from '@/features/auth/components/auth-form';
import { AuthFrame } from '@/features/auth/components/auth-frame';
import { useResetPassword } from '@/hooks/use-auth';
import { ApiError } from '@/lib/api';
import { space } from '@/lib/theme';

export function ResetPasswordScreen() {
  const { token } = useLocalSearchParams<{ token?: string }>();
  const router = useRouter();
  const reset = useResetPassword();
  const [done, setDone] = useState(false);
  const [linkSpent, setLinkSpent] = useState(false);
  const askAgain = (
    <Button
      testID="reset-password-new-link"
      label="Ask for a new link"
      variant="secondary"
      onPress={() => router.replace('/forgot-password')}
    />
  );

  if (!token) {
    return (
      <AuthFrame testID="reset-password-screen" title="Choose a new password">
        <FormError message="This link is missing its token. Open the link from the e-mail again, or ask for a new one." />
        {askAgain}
      </AuthFrame>
    );
  }

  if (done) {
    return (
      <AuthFrame testID="reset-password-screen" title="Password changed">
        <View style={styles.form} role="status" testID="reset-password-done">
          <Text>Your new password is set. Sign in with it now.</Text>
          <Button testID="reset-password-sign-in" label="Sign in" variant="primary" onPress={() => router.replace('/sign-in')} />
        </View>
      </AuthFrame>
    );
  }

  return (
    <AuthFrame testID="reset-password-screen" title="Choose a new password">
      <AuthForm
        initialValues={{ token, password: '' }}
        schema={resetPasswordSchema}
        onSubmit={async (values) => {
          await reset.trigger(values);
          setDone(true);
        }}
        onError={(error) => setLinkSpent(error instanceof ApiError && error.code === 'invalid_token')}
        submitLabel="Save the new password"
        submitTestID="reset-password-submit"
        notice={linkSpent ? askAgain : null}
      >
        <TextField
          name="password"
          label="New password"
          hint={`At least ${PASSWORD_MIN} characters. A short sentence is easy to type and hard to guess.`}
          testID="reset-password-password"
          autoComplete="new-password"
          secret
        />
      </AuthForm>
    </AuthFrame>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
});
