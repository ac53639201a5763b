import { Formik, useField } from 'formik';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { Role } from '@shared/auth/roles';
import { createInviteSchema } from '@shared/auth/schemas';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { Heading, Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { RolePicker } from '@/features/members/components/role-picker';
import { useCreateInvite } from '@/hooks/use-invites';
import { showServerError } from '@/lib/form-errors';
import { space } from '@/lib/theme';

/** Invite a new member by e-mail with the role they will have. */
export function InviteForm() {
  const create = useCreateInvite();
  const [sent, setSent] = useState<{ to: string; mailed: boolean } | null>(null);
  return (
    <Formik
      initialValues={{ email: '', role: 'tech' as Role }}
      validationSchema={createInviteSchema}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        setSent(null);
        const input = createInviteSchema.cast(values);
        try {
          const { mailSent } = await create.trigger(input);
          helpers.resetForm({ values: { email: '', role: values.role } });
          setSent({ to: input.email, mailed: mailSent });
        } catch (error) {
          showServerError(error, helpers);
        }
      }}
    >
      {({ handleSubmit, isSubmitting, status }) => (
        <View style={styles.form} testID="invite-form">
          <Heading level={2}>Invite someone</Heading>
          <Text tone="textMuted">They get an e-mail with a link to choose their name and password.</Text>
          <FormError message={status} />
          {sent?.mailed ? (
            <Text role="status" tone="success" testID="invite-sent">
              Invite sent to {sent.to}. It waits under Pending invites until they accept.
            </Text>
          ) : null}
          {sent && !sent.mailed ? (
            <FormError message={`The invite for ${sent.to} is saved, but its e-mail could not be sent. Check the mail settings, then revoke it and invite again.`} />
          ) : null}
          <TextField name="email" label="E-mail" testID="invite-email" keyboardType="email-address" inputMode="email" />
          <RoleField />
          <Button
            testID="invite-submit"
            label="Send invite"
            variant="primary"
            loading={isSubmitting}
            onPress={() => handleSubmit()}
            style={styles.start}
          />
        </View>
      )}
    </Formik>
  );
}

function RoleField() {
  const [field, , helpers] = useField<Role>('role');
  return <RolePicker testID="invite-role" value={field.value} onChange={(role) => void helpers.setValue(role)} />;
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  start: { alignSelf: 'flex-start' },
});
