import { StyleSheet, View } from 'react-native';
import type { ReportModel } from '@shared/report/report-model';
import { Text } from '@/components/ui/text';
import { space, useBreakpoints } from '@/lib/theme';
import { ReportField } from './report-field';

/** The machine, the customer and the complaint in their own words. */
export function ReportFacts({ report }: { report: ReportModel }) {
  const { isWide } = useBreakpoints();
  const { machine, customer } = report;
  return (
    <View style={styles.facts} testID="report-facts">
      <View style={[styles.columns, isWide && styles.wide]}>
        <View style={styles.column}>
          <Text variant="title" testID="report-machine">
            {machine.title}
          </Text>
          <ReportField label="Engine" value={machine.engine} />
          <ReportField label="VIN" value={machine.vin} mono />
          <ReportField label="Mileage" value={machine.mileage} />
        </View>
        <View style={styles.column}>
          <ReportField label="Customer" value={customer.name} testID="report-customer" />
          <ReportField label="Contact" value={[customer.contact, customer.email].filter(Boolean).join(' · ')} />
          <ReportField label="Procedure" value={report.procedure} />
        </View>
      </View>
      <ReportField label="The complaint, in the customer’s words" value={`“${report.complaint}”`} testID="report-complaint" />
    </View>
  );
}

const styles = StyleSheet.create({
  facts: { gap: space.lg },
  columns: { gap: space.lg },
  wide: { flexDirection: 'row' },
  column: { flex: 1, gap: space.md },
});
