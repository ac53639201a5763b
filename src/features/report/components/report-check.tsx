import { StyleSheet, View } from 'react-native';
import type { ReportLine } from '@shared/report/report-model';
import { SpecBar } from '@/components/spec-bar/spec-bar';
import { Text } from '@/components/ui/text';
import { VerdictChip } from '@/components/verdict/verdict-mark';
import { PhotoStrip } from '@/features/photos/photo-strip';
import { radius, space, useBreakpoints, useTheme } from '@/lib/theme';

/** One check on the path: what was checked, the reading as typed against its spec, the verdict in words and shape. */
export function ReportCheck({ line }: { line: ReportLine }) {
  const colors = useTheme();
  const { isWide } = useBreakpoints();
  const testID = `report-check-${line.number}`;
  return (
    <View testID={testID} role="listitem" style={[styles.check, { borderTopColor: colors.border }]}>
      <View style={[styles.head, isWide && styles.headWide]}>
        <View style={styles.titleRow}>
          <View style={[styles.number, { backgroundColor: colors.surfaceSunken }]}>
            <Text variant="label">{line.number}</Text>
          </View>
          <Text variant="bodyStrong" style={styles.shrink}>
            {line.title}
          </Text>
        </View>
        <View style={[styles.result, isWide && styles.resultWide]}>
          <Text variant={line.kind === 'measure' ? 'mono' : 'bodyStrong'} style={line.kind === 'measure' && styles.reading} testID={`${testID}-result`}>
            {line.result}
          </Text>
          {line.verdict ? <VerdictChip verdict={line.verdict} testID={`${testID}-verdict`} /> : null}
        </View>
      </View>
      <View style={styles.body}>
        {line.spec ? <Text testID={`${testID}-spec`}>Spec: {line.spec}</Text> : null}
        {line.measure ? (
          <View style={styles.bar}>
            <SpecBar spec={line.measure.check.spec} quantity={line.measure.quantity} evaluation={line.measure.evaluation} size="compact" testID={`${testID}-bar`} />
          </View>
        ) : null}
        {line.explanation ? (
          <Text variant="small" tone="textMuted">
            {line.explanation}
          </Text>
        ) : null}
        {line.note ? (
          <Text>
            <Text variant="bodyStrong">Note: </Text>
            {line.note}
          </Text>
        ) : null}
        <PhotoStrip photos={line.photos} of={line.title} testID={`${testID}-photos`} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  check: { borderTopWidth: 1, paddingTop: space.md, gap: space.sm },
  head: { gap: space.sm },
  headWide: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'flex-start' },
  titleRow: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexShrink: 1 },
  number: { width: 28, height: 28, borderRadius: radius.pill, alignItems: 'center', justifyContent: 'center' },
  shrink: { flexShrink: 1 },
  result: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md, paddingLeft: 36 },
  resultWide: { flexDirection: 'column', alignItems: 'flex-end', gap: space.xs, paddingLeft: 0 },
  reading: { fontSize: 26, lineHeight: 32 },
  body: { gap: space.sm, paddingLeft: 36 },
  bar: { maxWidth: 460 },
});
