import { StyleSheet, View } from 'react-native';
import { type ReportModel, SAFETY_NOTE } from '@shared/report/report-model';
import { Text } from '@/components/ui/text';
import { formatDateTime } from '@/lib/format';
import { space, useBreakpoints } from '@/lib/theme';
import { ReportField } from './report-field';
import { ReportSection } from './report-section';

/** Who did the work, when, how long it took, and the plain word on safety and the service manual. */
export function ReportWhoAndWhen({ report }: { report: ReportModel }) {
  const { isWide } = useBreakpoints();
  return (
    <ReportSection title="Who and when" testID="report-who">
      <View style={[styles.columns, isWide && styles.wide]}>
        <View style={styles.column}>
          <ReportField label={report.technicians.length > 1 ? 'Technicians' : 'Technician'} value={report.technicians.join(', ')} />
          <ReportField label="Started" value={formatDateTime(report.startedAt)} />
        </View>
        <View style={styles.column}>
          <ReportField label={report.status === 'concluded' ? 'Concluded' : 'Stopped'} value={report.endedAt && formatDateTime(report.endedAt)} />
          <ReportField label="Time spent" value={report.timeSpent} />
        </View>
      </View>
      <Text variant="small" tone="textMuted" testID="report-safety">
        {SAFETY_NOTE}
      </Text>
    </ReportSection>
  );
}

const styles = StyleSheet.create({
  columns: { gap: space.md },
  wide: { flexDirection: 'row' },
  column: { flex: 1, gap: space.md },
});
