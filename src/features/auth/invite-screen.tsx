import { useLocalSearchParams, useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { ROLE_DUTIES, ROLE_LABELS } from '@shared/auth/roles';
import { acceptInviteSchema, PASSWORD_MIN } from '@shared/auth/schemas';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { LoadingState } from '@/components/ui/loading-state';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { AuthForm } from '@/features/auth/components/auth-form';
import { AuthFrame } from '@/features/auth/components/auth-frame';
import { useAcceptInvite, useInvitePreview } from '@/hooks/use-invites';
import { useSession } from '@/lib/session';
import { space } from '@/lib/theme';

export function InviteScreen() {
  const { token } = useLocalSearchParams<{ token?: string }>();
  const router = useRouter();
  const { startSession } = useSession();
  const preview = useInvitePreview(token);
  const accept = useAcceptInvite();

  if (!token || preview.error) {
    return (
      <AuthFrame testID="invite-screen" title="This invite can't be used">
        <FormError
          message={
            preview.error?.message ?? 'This link is missing its token. Open the link from the e-mail again.'
          }
        />
        <Text>Invites work once and expire after a while. Ask your shop owner to send you a new one.</Text>
        <Button testID="invite-sign-in" label="Go to sign in" variant="quiet" onPress={() => router.replace('/sign-in')} />
      </AuthFrame>
    );
  }

  if (!preview.data) {
    return (
      <AuthFrame testID="invite-screen" title="Join your shop">
        <LoadingState label="Opening your invite…" />
      </AuthFrame>
    );
  }

  const { shopName, role, email } = preview.data;
  return (
    <AuthFrame testID="invite-screen" title={`Join ${shopName}`}>
      <View style={styles.offer} testID="invite-offer">
        <Badge label={ROLE_LABELS[role]} tone="primary" />
        <Text>{ROLE_DUTIES[role]}</Text>
        <Text tone="textMuted">
          You&apos;ll sign in as <Text variant="bodyStrong">{email}</Text>.
        </Text>
      </View>
      <AuthForm
        initialValues={{ token, name: '', password: '' }}
        schema={acceptInviteSchema}
        onSubmit={async (values) => {
          await startSession(await accept.trigger(values));
          router.replace('/');
        }}
        submitLabel={`Join ${shopName}`}
        submitTestID="invite-accept"
      >
        <TextField name="name" label="Your name" hint="As your shop will see it on diagnoses." testID="invite-name" autoComplete="name" />
        <TextField
          name="password"
          label="Choose a password"
          hint={`At least ${PASSWORD_MIN} characters.`}
          testID="invite-password"
          autoComplete="new-password"
          secret
        />
      </AuthForm>
    </AuthFrame>
  );
}

const styles = StyleSheet.create({
  offer: { gap: space.sm },
});
