import { Redirect, useRouter } from 'expo-router';
import { signInSchema } from '@shared/auth/schemas';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { AuthForm } from '@/features/auth/components/auth-form';
import { AuthFrame } from '@/features/auth/components/auth-frame';
import { useSignIn } from '@/hooks/use-auth';
import { useSession } from '@/lib/session';

export function SignInScreen() {
  const { session, startSession } = useSession();
  const router = useRouter();
  const signIn = useSignIn();

  if (session.status === 'signed-in') return <Redirect href="/" />;

  return (
    <AuthFrame testID="sign-in-screen" title="Sign in" intro="Use the e-mail address your shop invited.">
      <AuthForm
        initialValues={{ email: '', password: '' }}
        schema={signInSchema}
        onSubmit={async (values) => startSession(await signIn.trigger(values))}
        submitLabel="Sign in"
        submitTestID="sign-in-submit"
        footer={<Button testID="sign-in-forgot" label="Forgot your password?" variant="quiet" onPress={() => router.push('/forgot-password')} />}
      >
        <TextField name="email" label="E-mail" testID="sign-in-email" autoComplete="email" keyboardType="email-address" inputMode="email" />
        <TextField name="password" label="Password" testID="sign-in-password" autoComplete="current-password" secret />
      </AuthForm>
    </AuthFrame>
  );
}
