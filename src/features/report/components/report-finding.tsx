import { StyleSheet, View } from 'react-native';
import type { ReportModel } from '@shared/report/report-model';
import { Icon } from '@/components/ui/icon';
import { Text } from '@/components/ui/text';
import { radius, space, useTheme } from '@/lib/theme';
import { ReportField } from './report-field';
import { ReportSection } from './report-section';

/** What was found and what to do about it, first thing on the page; or why the diagnosis stopped. */
export function ReportFinding({ report }: { report: ReportModel }) {
  const colors = useTheme();
  if (!report.finding) {
    if (report.status === 'open') {
      return (
        <Text tone="warning" variant="bodyStrong" testID="report-in-progress">
          This diagnosis is still in progress: there is no finding yet.
        </Text>
      );
    }
    return (
      <ReportSection title="Stopped without a finding" testID="report-stopped">
        <Text>{report.abandonReason}</Text>
      </ReportSection>
    );
  }
  return (
    <ReportSection title="What we found" testID="report-finding">
      <View style={[styles.box, { backgroundColor: colors.primarySoft, borderLeftColor: colors.primary }]}>
        <View style={styles.titleRow}>
          <Icon name="report" size={26} color={colors.primary} />
          <Text variant="title" style={styles.shrink}>
            {report.finding.title}
          </Text>
        </View>
        <Text variant="bodyStrong" tone="textMuted">
          Part: {report.finding.part}
        </Text>
        <Text>
          <Text variant="bodyStrong">Recommended action: </Text>
          {report.finding.action}
        </Text>
      </View>
      <ReportField label="What was done" value={report.closingNote} />
      <ReportField label="Parts" value={report.parts} />
      <ReportField label="Labour" value={report.labour} />
    </ReportSection>
  );
}

const styles = StyleSheet.create({
  box: { borderLeftWidth: 5, borderRadius: radius.md, padding: space.lg, gap: space.sm },
  titleRow: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  shrink: { flexShrink: 1 },
});
