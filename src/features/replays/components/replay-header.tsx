import { StyleSheet, View } from 'react-native';
import type { DiagnosisDetail } from '@shared/api/diagnosis-types';
import { Button } from '@/components/ui/button';
import { Heading, Text } from '@/components/ui/text';
import { formatDuration } from '@/features/replays/replay-path';
import { formatDate } from '@/lib/format';
import { space } from '@/lib/theme';

interface ReplayHeaderProps {
  diagnosis: DiagnosisDetail;
  practice: boolean;
  onMode: (practice: boolean) => void;
  onBack: () => void;
  /** Title and machine only: on a phone past the first step, so the step itself starts near the top. */
  compact?: boolean;
}

/** What is being replayed, and the switch between watching and practising. */
export function ReplayHeader({ diagnosis: d, practice, onMode, onBack, compact = false }: ReplayHeaderProps) {
  if (compact) {
    return (
      <View style={styles.header}>
        <Button testID="replay-back" label="All replays" icon="back" variant="quiet" onPress={onBack} style={styles.back} />
        <View style={styles.titles}>
          <Text variant="bodyStrong" testID="replay-title">
            {d.procedureTitle}
          </Text>
          <Text variant="small" tone="textMuted">{`${d.machine}${practice ? ' · practice' : ''}`}</Text>
        </View>
      </View>
    );
  }
  const detours = d.steps.filter((s) => s.retracted).length;
  const took = d.endedAt ? formatDuration(Date.parse(d.endedAt) - Date.parse(d.startedAt)) : null;
  const facts = [
    `${d.startedBy} · ${formatDate(d.startedAt)}`,
    `${d.stepCount} steps${detours ? `, ${detours} taken back` : ''}`,
    took ? `took ${took}` : null,
  ].filter(Boolean);
  return (
    <View style={styles.header}>
      <Button testID="replay-back" label="All replays" icon="back" variant="quiet" onPress={onBack} style={styles.back} />
      <View style={styles.titles}>
        <Heading testID="replay-title">{d.procedureTitle}</Heading>
        <Text variant="bodyStrong">{`${d.machine} · version ${d.versionNumber}`}</Text>
        <Text tone="textMuted">{`“${d.complaint}”`}</Text>
        <Text variant="small" tone="textMuted">
          {facts.join(' · ')}
        </Text>
      </View>
      <View style={styles.modes} role="group" aria-label="Replay mode">
        <Button testID="mode-watch" label="Watch" selected={!practice} onPress={() => onMode(false)} style={styles.mode} />
        <Button testID="mode-practice" label="Practise" selected={practice} onPress={() => onMode(true)} style={styles.mode} />
      </View>
      <Text variant="small" tone="textMuted">
        {practice
          ? 'Before each step is revealed, make your call: the verdict on the reading, or the check that comes next. The server scores it.'
          : 'Step through the path as it was taken, detours included.'}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  header: { gap: space.md },
  back: { alignSelf: 'flex-start', marginLeft: -space.lg },
  titles: { gap: space.xs },
  modes: { flexDirection: 'row', gap: space.sm },
  mode: { flex: 1, maxWidth: 200, minHeight: 48 },
});
