import { useLocalSearchParams, useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import type { MailSummary } from '@shared/api/types';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { MailMessageView } from '@/features/outbox/components/mail-message-view';
import { useMailList } from '@/hooks/use-mail';
import { formatDateTime } from '@/lib/format';
import { radius, space, useBreakpoints, useTheme } from '@/lib/theme';

/** The shop's sent mail. A desk shows the list and the open message side by side; a phone shows one at a time. */
export function OutboxScreen() {
  const { id } = useLocalSearchParams<{ id?: string }>();
  const { isDesk } = useBreakpoints();
  const router = useRouter();

  if (id && !isDesk) {
    return (
      <Screen testID="outbox-message-screen" title="Outbox" width="form">
        <Button
          testID="outbox-back"
          label="All mail"
          icon="back"
          variant="quiet"
          onPress={() => (router.canGoBack() ? router.back() : router.replace('/outbox'))}
          style={styles.start}
        />
        <Card>
          <MailMessageView id={id} />
        </Card>
      </Screen>
    );
  }

  return (
    <Screen
      testID="outbox-screen"
      title="Outbox"
      subtitle="Every e-mail Probepath sent for this shop: invites, password links and customer reports. Links open in a new tab."
    >
      <OutboxBody selectedId={id} split={isDesk} />
    </Screen>
  );
}

function OutboxBody({ selectedId, split }: { selectedId?: string; split: boolean }) {
  const colors = useTheme();
  const router = useRouter();
  const mail = useMailList();
  if (mail.error) return <ErrorState title="Couldn't load the outbox" error={mail.error} onRetry={() => void mail.mutate()} />;
  if (!mail.data) return <LoadingState label="Loading the outbox…" />;
  if (mail.data.messages.length === 0) {
    return (
      <EmptyState
        icon="outbox"
        title="No mail sent yet"
        body="Invites and password-reset links appear here as soon as Probepath sends them. Invite someone under Members to send the first."
        action={{ label: 'Go to Members', testID: 'outbox-to-members', onPress: () => router.navigate('/members') }}
      />
    );
  }

  const list = (
    <View role="list" style={[styles.list, { borderColor: colors.border, backgroundColor: colors.surface }]} testID="mail-list">
      {mail.data.messages.map((m: MailSummary, index) => (
        <View key={m.id} role="listitem" style={index > 0 && { borderTopWidth: 1, borderTopColor: colors.border }}>
          <Button
            testID={`mail-${m.id}`}
            variant="row"
            label={m.subject}
            description={`To ${m.to} · ${formatDateTime(m.createdAt)}`}
            ariaLabel={`${m.subject}, to ${m.to}, ${formatDateTime(m.createdAt)}`}
            selected={m.id === selectedId}
            onPress={() => router.navigate(`/outbox/${m.id}`)}
          />
        </View>
      ))}
    </View>
  );
  if (!split) return list;
  return (
    <View style={styles.split}>
      <View style={styles.listPane}>{list}</View>
      <Card style={styles.messagePane}>
        {selectedId ? (
          <MailMessageView id={selectedId} />
        ) : (
          <Text tone="textMuted" testID="outbox-pick">
            Pick a message on the left to read it here.
          </Text>
        )}
      </Card>
    </View>
  );
}

const styles = StyleSheet.create({
  start: { alignSelf: 'flex-start' },
  split: { flexDirection: 'row', alignItems: 'flex-start', gap: space.xl },
  listPane: { width: 400 },
  messagePane: { flex: 1 },
  list: { borderWidth: 1, borderRadius: radius.lg, overflow: 'hidden' },
});
