import { View } from 'react-native';
import type { ReportModel } from '@shared/report/report-model';
import { Text } from '@/components/ui/text';
import { space } from '@/lib/theme';
import { ReportCheck } from './report-check';
import { ReportSection } from './report-section';

export function ReportChecks({ report }: { report: ReportModel }) {
  const n = report.retakenCount;
  return (
    <ReportSection title={`What we checked (${report.lines.length})`} testID="report-checks">
      {n > 0 ? (
        <Text variant="small" tone="textMuted">
          {n} reading{n > 1 ? 's were' : ' was'} taken again; only the reading that counted is listed.
        </Text>
      ) : null}
      <View role="list" style={{ gap: space.md }}>
        {report.lines.map((line) => (
          <ReportCheck key={line.stepId} line={line} />
        ))}
      </View>
    </ReportSection>
  );
}
