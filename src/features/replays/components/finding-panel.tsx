import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import type { DiagnosisDetail } from '@shared/api/diagnosis-types';
import { Icon } from '@/components/ui/icon';
import { Heading, Text } from '@/components/ui/text';
import { formatDuration } from '@/features/replays/replay-path';
import { radius, space, useTheme } from '@/lib/theme';

/** The end of the path: the finding, what was done about it and how long it all took. */
export function FindingPanel({ diagnosis, children }: { diagnosis: DiagnosisDetail; children?: ReactNode }) {
  const c = useTheme();
  const conclusion = diagnosis.conclusion;
  const check = diagnosis.document.checks.find((ch) => ch.id === conclusion?.findingCheckId);
  const took = diagnosis.endedAt ? Date.parse(diagnosis.endedAt) - Date.parse(diagnosis.startedAt) : null;
  return (
    <View style={styles.panel} testID="replay-finding">
      <Text variant="label" tone="textMuted">
        THE FINDING
      </Text>
      <View style={[styles.banner, { backgroundColor: c.primarySoft, borderColor: c.primary }]}>
        <Icon name="check" size={30} color={c.primary} />
        <View style={styles.grow}>
          <Heading level={2}>{check?.title ?? diagnosis.finding ?? 'Finding'}</Heading>
          {check?.kind === 'finding' ? <Text>{check.finding.action}</Text> : null}
        </View>
      </View>
      {conclusion?.note ? <Block label="What the technician found and did">{conclusion.note}</Block> : null}
      {conclusion?.parts ? <Block label="Parts">{conclusion.parts}</Block> : null}
      <Block label="Time">
        {[
          took === null ? null : `${formatDuration(took)} from the first check to the conclusion`,
          conclusion?.labourMinutes ? `${formatDuration(conclusion.labourMinutes * 60_000)} of labour billed` : null,
        ]
          .filter(Boolean)
          .join(' · ')}
      </Block>
      {children}
    </View>
  );
}

function Block({ label, children }: { label: string; children: string }) {
  return (
    <View style={styles.block}>
      <Text variant="label" tone="textMuted">
        {label.toUpperCase()}
      </Text>
      <Text>{children}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { gap: space.lg },
  banner: { flexDirection: 'row', gap: space.md, borderWidth: 2, borderRadius: radius.lg, padding: space.lg },
  grow: { flex: 1, gap: space.xs },
  block: { gap: space.xs },
});
