import { StyleSheet, View } from 'react-native';
import { Button } from '@/components/ui/button';
import { Icon } from '@/components/ui/icon';
import { Text } from '@/components/ui/text';
import { layout, radius, space, useTheme } from '@/lib/theme';

/** Where sending stands: nothing when the server has everything. */
export function SyncStatus({ pending, offline, notRecorded, onSendNow, onShowPath }: { pending: number; offline: boolean; notRecorded: number; onSendNow: () => void; onShowPath: (() => void) | null }) {
  const colors = useTheme();
  if (notRecorded) {
    return (
      <View testID="sync-refused" role="alert" style={[styles.box, { backgroundColor: colors.dangerSoft, borderLeftColor: colors.danger }]}>
        <Icon name="alert" color={colors.danger} />
        <Text style={styles.text}>
          {notRecorded === 1 ? 'One step was' : `${notRecorded} steps were`} not recorded: the diagnosis changed on the server. What you typed is kept on the path.
        </Text>
        {onShowPath ? <Button testID="sync-show-path" variant="quiet" label="See the path" onPress={onShowPath} style={styles.tall} /> : null}
      </View>
    );
  }
  if (!pending) return null;
  return (
    <View testID="sync-pending" role="status" style={[styles.box, { backgroundColor: colors.warningSoft, borderLeftColor: colors.warning }]}>
      <Icon name={offline ? 'unplugged' : 'pending'} color={colors.warning} />
      <Text style={styles.text}>
        {offline
          ? `No signal. ${pending === 1 ? 'One step is' : `${pending} steps are`} saved on this phone and will be sent in order when the connection is back.`
          : `Sending ${pending === 1 ? 'one step' : `${pending} steps`}…`}
      </Text>
      {offline ? <Button testID="sync-send-now" variant="quiet" label="Send now" onPress={onSendNow} style={styles.tall} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: space.md, borderLeftWidth: 6, borderRadius: radius.md, padding: space.md },
  text: { flex: 1, minWidth: 200 },
  tall: { minHeight: layout.primaryTouch },
});
