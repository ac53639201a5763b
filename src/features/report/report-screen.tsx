import { useLocalSearchParams } from 'expo-router';
import { useMemo } from 'react';
import { StyleSheet, View } from 'react-native';
import { buildReport, REPORT_TITLE } from '@shared/report/report-model';
import { Badge } from '@/components/ui/badge';
import { Card } from '@/components/ui/card';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { Heading, Text } from '@/components/ui/text';
import { useDiagnosis } from '@/hooks/use-diagnosis';
import { formatDate } from '@/lib/format';
import { useUser } from '@/lib/session';
import { space, useBreakpoints, useTheme } from '@/lib/theme';
import { EmailReport } from './components/email-report';
import { ReportChecks } from './components/report-checks';
import { ReportFacts } from './components/report-facts';
import { ReportFileActions } from './components/report-file-actions';
import { ReportFinding } from './components/report-finding';
import { ReportPhotos } from './components/report-photos';
import { ReportWhoAndWhen } from './components/report-who-and-when';
import { PrintStyle } from './print-style';

const RUNNERS = new Set(['owner', 'lead', 'tech']);
/** About 80 characters of body text: a page, not a dashboard. */
const REPORT_WIDTH = 800;

/**
 * The customer's report of one diagnosis, in one column that reads at a glance
 * and prints clean: what was found first, then every check with its reading,
 * spec and verdict. Every role that may read the diagnosis may open it.
 */
export function ReportScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const user = useUser();
  const colors = useTheme();
  const { isWide } = useBreakpoints();
  const diagnosis = useDiagnosis(id);
  const runner = RUNNERS.has(user.role);
  const report = useMemo(() => (diagnosis.data ? buildReport(diagnosis.data.diagnosis) : null), [diagnosis.data]);

  let body;
  if (diagnosis.error) body = <ErrorState title="Couldn't open this report" error={diagnosis.error} onRetry={() => void diagnosis.mutate()} />;
  else if (!report) body = <LoadingState label="Opening the report…" />;
  else {
    body = (
      <View style={styles.column}>
        <PrintStyle />
        <View style={styles.actions} testID="report-actions">
          <ReportFileActions diagnosisId={id} />
          {runner && report.status === 'concluded' ? <EmailReport diagnosisId={id} customerEmail={report.customer.email} /> : null}
        </View>
        <Card testID="report-paper" style={[styles.paper, { padding: isWide ? space.xxl : space.lg }]}>
          <View style={[styles.letterhead, { borderBottomColor: colors.primary }]}>
            <View style={styles.shrink}>
              <Heading level={2} variant="heading" testID="report-shop">
                {user.shopName}
              </Heading>
              <Text tone="textMuted">{REPORT_TITLE}</Text>
            </View>
            <View style={[styles.dates, isWide && styles.datesWide]}>
              <Text variant="bodyStrong">{formatDate(report.endedAt ?? report.startedAt)}</Text>
              {report.reference ? <Text tone="textMuted">Job {report.reference}</Text> : null}
              {report.status !== 'concluded' ? <Badge label={report.status === 'open' ? 'In progress' : 'Stopped'} tone="warning" icon="pending" /> : null}
            </View>
          </View>
          <ReportFacts report={report} />
          <ReportFinding report={report} />
          <ReportChecks report={report} />
          <ReportPhotos diagnosisId={id} photos={report.photos} canAdd={runner && report.status !== 'abandoned'} />
          <ReportWhoAndWhen report={report} />
        </Card>
      </View>
    );
  }

  return (
    <Screen testID="report-screen" title={report ? `Report: ${report.machine.title}` : 'Report'}>
      {body}
    </Screen>
  );
}

const styles = StyleSheet.create({
  column: { width: '100%', maxWidth: REPORT_WIDTH, gap: space.lg },
  actions: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start', gap: space.md },
  paper: { gap: space.xl },
  letterhead: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', gap: space.md, borderBottomWidth: 4, paddingBottom: space.md },
  shrink: { flexShrink: 1, gap: space.xs },
  dates: { alignItems: 'flex-start', gap: space.xs },
  datesWide: { alignItems: 'flex-end' },
});
