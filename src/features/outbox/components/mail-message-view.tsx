import { StyleSheet, View } from 'react-native';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Heading, Text } from '@/components/ui/text';
import { MailBody } from '@/features/outbox/components/mail-body';
import { useMailMessage } from '@/hooks/use-mail';
import { formatDateTime } from '@/lib/format';
import { space, useTheme } from '@/lib/theme';

/** One captured message: who it went to, when, and its text with live links. */
export function MailMessageView({ id }: { id: string }) {
  const colors = useTheme();
  const message = useMailMessage(id);
  if (message.error) {
    return <ErrorState title="Couldn't open this message" error={message.error} onRetry={() => void message.mutate()} />;
  }
  if (!message.data) return <LoadingState label="Opening the message…" />;
  const { subject, from, to, createdAt, text, attachments } = message.data.message;
  return (
    <View style={styles.message} testID="mail-message">
      <Heading level={2}>{subject}</Heading>
      <View style={[styles.meta, { borderBottomColor: colors.border }]}>
        <Text tone="textMuted">From {from}</Text>
        <Text tone="textMuted">To {to}</Text>
        <Text tone="textMuted">{formatDateTime(createdAt)}</Text>
        {attachments.map((a) => (
          <Text key={a.filename} tone="textMuted" testID="mail-attachment">
            Attached: {a.filename} ({Math.max(1, Math.round(a.size / 1024))} KB)
          </Text>
        ))}
      </View>
      <MailBody text={text} />
    </View>
  );
}

const styles = StyleSheet.create({
  message: { gap: space.lg },
  meta: { gap: space.xs, borderBottomWidth: 1, paddingBottom: space.lg },
});
