import { Redirect, useRouter } from 'expo-router';
import { Formik } from 'formik';
import { StyleSheet, View } from 'react-native';
import { signInSchema } from '@shared/auth/schemas';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { TextField } from '@/components/ui/text-field';
import { AuthFrame } from '@/features/auth/components/auth-frame';
import { useSignIn } from '@/hooks/use-auth';
import { showServerError } from '@/lib/form-errors';
import { useSession } from '@/lib/session';
import { space } from '@/lib/theme';

export function SignInScreen() {
  const { session, startSession } = useSession();
  const router = useRouter();
  const signIn = useSignIn();

  if (session.status === 'signed-in') return <Redirect href="/" />;

  return (
    <AuthFrame testID="sign-in-screen" title="Sign in" intro="Use the e-mail address your shop invited.">
      <Formik
        initialValues={{ email: '', password: '' }}
        validationSchema={signInSchema}
        onSubmit={async (values, helpers) => {
          helpers.setStatus(undefined);
          try {
            await startSession(await signIn.trigger(signInSchema.cast(values)));
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
              testID="sign-in-email"
              autoComplete="email"
              keyboardType="email-address"
              inputMode="email"
            />
            <TextField name="password" label="Password" testID="sign-in-password" autoComplete="current-password" secret />
            <Button
              testID="sign-in-submit"
              label="Sign in"
              variant="primary"
              loading={isSubmitting}
              onPress={() => handleSubmit()}
            />
            <Button
              testID="sign-in-forgot"
              label="Forgot your password?"
              variant="quiet"
              onPress={() => router.push('/forgot-password')}
            />
          </View>
        )}
      </Formik>
    </AuthFrame>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
});
