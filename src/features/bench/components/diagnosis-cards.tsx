import { StyleSheet, View } from 'react-native';
import type { DiagnosisSummary } from '@shared/api/diagnosis-types';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Heading, Text } from '@/components/ui/text';
import { formatDateTime } from '@/lib/format';
import { layout, space } from '@/lib/theme';

/** An open diagnosis to pick up again: the machine, the complaint in the customer's words, how far it got. */
export function OpenDiagnosisCard({ diagnosis: d, pending, onResume }: { diagnosis: DiagnosisSummary; pending: number; onResume: () => void }) {
  return (
    <Card testID={`open-diagnosis-${d.id}`} style={styles.card}>
      <View style={styles.head}>
        <Heading level={3} style={styles.grow}>
          {d.machine}
        </Heading>
        {pending ? <Badge tone="warning" icon="pending" label={`${pending} waiting to send`} /> : null}
      </View>
      <Text variant="small" tone="textMuted">
        {d.customerName} · {d.procedureTitle} (v{d.versionNumber})
      </Text>
      <Text style={styles.complaint}>“{d.complaint}”</Text>
      <Text variant="small" tone="textMuted">
        {d.stepCount === 1 ? '1 step' : `${d.stepCount} steps`} · started {formatDateTime(d.startedAt)} by {d.startedBy}
      </Text>
      <Button
        testID={`resume-${d.id}`}
        variant="primary"
        icon="forward"
        label="Resume"
        ariaLabel={`Resume the diagnosis of ${d.machine}`}
        onPress={onResume}
      />
    </Card>
  );
}

/** A concluded diagnosis: what was found, and the way to its path and its report. */
export function ConcludedDiagnosisCard({ diagnosis: d, onOpen, onReport }: { diagnosis: DiagnosisSummary; onOpen: () => void; onReport: () => void }) {
  return (
    <Card testID={`concluded-diagnosis-${d.id}`} style={styles.card}>
      <Heading level={3}>{d.machine}</Heading>
      <Text variant="small" tone="textMuted">
        {d.customerName} · concluded {d.endedAt ? formatDateTime(d.endedAt) : ''} by {d.startedBy}
      </Text>
      <View style={styles.finding}>
        <Badge tone="success" icon="check" label="Finding" />
        <Text variant="bodyStrong" style={styles.grow}>
          {d.finding}
        </Text>
      </View>
      <View style={styles.actions}>
        <Button testID={`path-${d.id}`} icon="path" label="Path" ariaLabel={`Path of the diagnosis of ${d.machine}`} onPress={onOpen} style={styles.grow} />
        <Button testID={`report-${d.id}`} icon="report" label="Report" ariaLabel={`Report for ${d.machine}`} onPress={onReport} style={styles.grow} />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { flexGrow: 1, flexBasis: 320 },
  head: { flexDirection: 'row', alignItems: 'flex-start', gap: space.sm, flexWrap: 'wrap' },
  grow: { flexGrow: 1, flexShrink: 1, minHeight: layout.primaryTouch },
  complaint: { fontStyle: 'italic' },
  finding: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
  actions: { flexDirection: 'row', gap: space.md },
});
