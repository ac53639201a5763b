import { StyleSheet, View } from 'react-native';
import type { ValidationProblem } from '@shared/engine/validate-procedure';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Heading } from '@/components/ui/text';
import { space } from '@/lib/theme';

/** What stands between the draft and publishing; each problem selects its check. */
export function ProblemsPanel({ problems, onSelect }: { problems: readonly ValidationProblem[]; onSelect: (id: string) => void }) {
  return (
    <View style={styles.panel} testID="problems-panel" aria-live="polite">
      <View style={styles.head}>
        <Heading level={2} variant="bodyStrong">
          Validation
        </Heading>
        {problems.length ? <Badge tone="danger" icon="alert" label={`${problems.length} to fix`} /> : <Badge tone="success" icon="check" label="Ready to publish" />}
      </View>
      {problems.map((p, i) => (
        <Button key={`${p.checkId}-${p.code}-${i}`} testID={`problem-${i}`} variant="row" label={p.message} description={`${p.checkId} · ${p.code.replace(/_/g, ' ')}`} onPress={() => onSelect(p.checkId)} />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { gap: space.sm },
  head: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.sm },
});
