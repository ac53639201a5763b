import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useSWRConfig } from 'swr';
import { ROLE_DUTIES, type Role } from '@shared/auth/roles';
import type { Member } from '@shared/api/types';
import type { UpdateMemberInput } from '@shared/auth/schemas';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { Heading, Text } from '@/components/ui/text';
import { RolePicker } from '@/features/members/components/role-picker';
import { ME_KEY } from '@/hooks/use-me';
import { useUpdateMember } from '@/hooks/use-members';
import { space } from '@/lib/theme';

/** Change one member's role, or deactivate / reactivate them after a confirm. */
export function MemberEditor({ member, isSelf }: { member: Member; isSelf: boolean }) {
  const update = useUpdateMember();
  const { mutate } = useSWRConfig();
  const [error, setError] = useState<string | null>(null);
  const [confirming, setConfirming] = useState(false);
  const [pendingRole, setPendingRole] = useState<Role | null>(null);
  const firstName = member.name.split(' ')[0];

  async function change(changes: UpdateMemberInput) {
    setError(null);
    try {
      await update.trigger({ id: member.id, changes });
      setConfirming(false);
      // Changing your own role changes what you may see.
      if (isSelf) await mutate(ME_KEY);
    } catch (e) {
      setError((e as Error).message);
    } finally {
      setPendingRole(null);
    }
  }

  return (
    <View style={styles.editor} testID={`member-editor-${member.id}`}>
      <Heading level={3}>Manage {member.name}</Heading>
      <FormError message={error} />
      <RolePicker
        testID="member-role"
        value={member.role}
        pending={pendingRole}
        disabled={update.isMutating}
        onChange={(role) => {
          if (role === member.role) return;
          setPendingRole(role);
          void change({ role });
        }}
      />
      <Text tone="textMuted">{ROLE_DUTIES[member.role]}</Text>
      {!member.active ? (
        <Button
          testID="member-reactivate"
          label={`Reactivate ${firstName}`}
          variant="primary"
          loading={update.isMutating && !pendingRole}
          onPress={() => void change({ active: true })}
          style={styles.start}
        />
      ) : confirming ? (
        <View role="alert" style={styles.confirm} testID="member-deactivate-confirm">
          <Text>
            Deactivate {member.name}? They are signed out and can&apos;t sign in until you reactivate them. Their
            diagnoses stay in the shop&apos;s records.
          </Text>
          <View style={styles.actions}>
            <Button testID="member-deactivate-cancel" label="Keep active" onPress={() => setConfirming(false)} />
            <Button
              testID="member-deactivate-yes"
              label={`Deactivate ${firstName}`}
              variant="danger"
              loading={update.isMutating}
              onPress={() => void change({ active: false })}
            />
          </View>
        </View>
      ) : (
        <Button
          testID="member-deactivate"
          label="Deactivate…"
          ariaLabel={`Deactivate ${member.name}`}
          disabled={update.isMutating}
          onPress={() => setConfirming(true)}
          style={styles.start}
        />
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  editor: { gap: space.lg },
  confirm: { gap: space.md },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  start: { alignSelf: 'flex-start' },
});
