import { StyleSheet, View } from 'react-native';
import type { PracticeResult } from '@shared/api/replay-types';
import { Button } from '@/components/ui/button';
import { Icon } from '@/components/ui/icon';
import { Heading, Text } from '@/components/ui/text';
import { radius, space, useTheme } from '@/lib/theme';

interface PracticeSummaryProps {
  results: { title: string; position: number; result: PracticeResult }[];
  /** Questions shown in this pass (some may have been skipped past). */
  asked: number;
  onAgain: () => void;
  onHistory: () => void;
}

/** The score of one practice pass, question by question. */
export function PracticeSummary({ results, asked, onAgain, onHistory }: PracticeSummaryProps) {
  const c = useTheme();
  const right = results.filter((r) => r.result.attempt.correct).length;
  return (
    <View testID="practice-summary" style={[styles.box, { borderColor: c.signal, backgroundColor: c.surface }]}>
      <Text variant="label" tone="textMuted">
        YOUR SCORE
      </Text>
      <Heading level={2} testID="practice-score">{`${right} of ${asked} right`}</Heading>
      <View role="list" style={styles.list}>
        {results.map(({ title, position, result }) => (
          <View key={position} role="listitem" style={[styles.row, { borderTopColor: c.border }]}>
            <Icon name={result.attempt.correct ? 'check' : 'alert'} color={result.attempt.correct ? c.success : c.danger} />
            <View style={styles.grow}>
              <Text variant="bodyStrong">{`Step ${position}: ${title}`}</Text>
              <Text variant="small" tone="textMuted">
                {result.attempt.correct ? `Right: ${result.expectedLabel}` : `Not this time: the answer was ${result.expectedLabel}`}
              </Text>
            </View>
          </View>
        ))}
      </View>
      <View style={styles.actions}>
        <Button testID="practice-again" label="Practise again" variant="primary" onPress={onAgain} />
        <Button testID="practice-history" label="My practice" onPress={onHistory} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderWidth: 3, borderRadius: radius.lg, padding: space.lg, gap: space.md },
  list: { gap: 0 },
  row: { flexDirection: 'row', alignItems: 'flex-start', gap: space.md, paddingVertical: space.sm, borderTopWidth: 1 },
  grow: { flex: 1 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
