import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { ROLE_LABELS } from '@shared/auth/roles';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { LoadingState } from '@/components/ui/loading-state';
import { Heading, Text } from '@/components/ui/text';
import { useInvites, useRevokeInvite } from '@/hooks/use-invites';
import { formatDate } from '@/lib/format';
import { space, useTheme } from '@/lib/theme';

/** Invites not yet accepted, each with a way to take it back. */
export function PendingInvites() {
  const colors = useTheme();
  const invites = useInvites();
  const revoke = useRevokeInvite();
  const [revoking, setRevoking] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);

  async function revokeInvite(id: string) {
    setError(null);
    setRevoking(id);
    try {
      await revoke.trigger(id);
    } catch (e) {
      setError((e as Error).message);
    } finally {
      setRevoking(null);
    }
  }

  return (
    <View style={styles.wrap} testID="pending-invites">
      <Heading level={2}>Pending invites</Heading>
      <FormError message={error ?? invites.error?.message} />
      {!invites.data ? (
        invites.error ? null : <LoadingState label="Loading invites…" />
      ) : invites.data.invites.length === 0 ? (
        <Text tone="textMuted" testID="pending-invites-empty">
          No invites waiting. An invite you send appears here until it is accepted, revoked or expires.
        </Text>
      ) : (
        invites.data.invites.map((invite) => (
          <View
            key={invite.id}
            testID={`invite-${invite.email}`}
            style={[styles.item, { borderTopColor: colors.border }]}
          >
            <View style={styles.text}>
              <Text variant="bodyStrong">{invite.email}</Text>
              <Badge label={ROLE_LABELS[invite.role]} tone="primary" />
              <Text variant="small" tone="textMuted">
                Sent {formatDate(invite.createdAt)} · expires {formatDate(invite.expiresAt)}
              </Text>
            </View>
            <Button
              testID={`revoke-${invite.email}`}
              label="Revoke"
              ariaLabel={`Revoke the invite for ${invite.email}`}
              loading={revoking === invite.id}
              onPress={() => void revokeInvite(invite.id)}
            />
          </View>
        ))
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  item: { flexDirection: 'row', alignItems: 'center', gap: space.md, borderTopWidth: 1, paddingTop: space.md },
  text: { flex: 1, gap: space.xs },
});
