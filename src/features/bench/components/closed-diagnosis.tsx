import { useRouter } from 'expo-router';
import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import type { DiagnosisDetail } from '@shared/api/diagnosis-types';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Heading, Text } from '@/components/ui/text';
import { formatDateTime } from '@/lib/format';
import { layout, space, useBreakpoints } from '@/lib/theme';
import type { LocalDiagnosis, PathStep } from '../offline/local-path';
import { PathList } from './path-list';
import { StepPhotos } from './step-photos';

/** A concluded or abandoned diagnosis: the outcome, the way to the report, and the path that led there. */
export function ClosedDiagnosis({ detail, local, stepExtras }: { detail: DiagnosisDetail; local: LocalDiagnosis; stepExtras: (step: PathStep) => ReactNode }) {
  const router = useRouter();
  const { isWide } = useBreakpoints();
  const finding = detail.document.checks.find((c) => c.id === detail.conclusion?.findingCheckId);
  return (
    <ScrollView contentContainerStyle={[styles.content, { padding: isWide ? space.xl : space.lg }]} testID="closed-diagnosis">
      {detail.status === 'concluded' && detail.conclusion ? (
        <Card testID="conclusion">
          <Text variant="label" tone="textMuted">
            CONCLUDED {detail.endedAt ? formatDateTime(detail.endedAt).toUpperCase() : ''}
          </Text>
          <Heading level={2}>{finding?.title ?? detail.finding}</Heading>
          {finding?.kind === 'finding' ? <Text>{finding.finding.action}</Text> : null}
          {detail.conclusion.parts ? <Text>Parts: {detail.conclusion.parts}</Text> : null}
          {detail.conclusion.labourMinutes !== null ? <Text>Labour: {detail.conclusion.labourMinutes} min</Text> : null}
          {detail.conclusion.note ? <Text tone="textMuted">{detail.conclusion.note}</Text> : null}
          <StepPhotos diagnosisId={detail.id} stepId={null} name="repair" of="the repair" heading="Photos of the repair" canAdd />
          <View style={styles.actions}>
            <Button testID="open-report" variant="primary" icon="report" label="Open the report" onPress={() => router.push(`/report/${detail.id}`)} style={styles.grow} />
            <Button testID="back-to-bench" icon="bench" label="My bench" onPress={() => router.navigate('/bench')} style={styles.grow} />
          </View>
        </Card>
      ) : (
        <Card testID="abandoned">
          <Heading level={2}>Stopped without a finding</Heading>
          <Text>{detail.abandonReason}</Text>
          <View style={styles.actions}>
            <Button testID="open-report" icon="report" label="Open the report" onPress={() => router.push(`/report/${detail.id}`)} style={styles.grow} />
            <Button testID="back-to-bench" icon="bench" label="My bench" onPress={() => router.navigate('/bench')} style={styles.grow} />
          </View>
        </Card>
      )}
      <Heading level={2}>Path</Heading>
      <PathList document={detail.document} local={local} stepExtras={stepExtras} />
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  content: { gap: space.xl, maxWidth: layout.maxFormWidth + 200, width: '100%', alignSelf: 'center' },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  grow: { flexGrow: 1, minHeight: layout.primaryTouch },
});
