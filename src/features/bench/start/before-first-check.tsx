import { StyleSheet, View } from 'react-native';
import type { ProcedureSummary } from '@shared/api/procedure-types';
import { Button } from '@/components/ui/button';
import { ErrorState } from '@/components/ui/error-state';
import { FormError } from '@/components/ui/form-error';
import { LoadingState } from '@/components/ui/loading-state';
import { Text } from '@/components/ui/text';
import { useProcedureVersion } from '@/hooks/use-procedures';
import { space } from '@/lib/theme';
import { CautionList, MANUAL_FIRST } from '../components/caution-list';

/** Step 4: the procedure's cautions, read before the first check; then start. */
export function BeforeFirstCheck({ procedure, starting, error, onStart }: { procedure: ProcedureSummary; starting: boolean; error: string | null; onStart: () => void }) {
  const version = useProcedureVersion(procedure.id, procedure.latestPublished);
  if (version.error) return <ErrorState title="Can't load the procedure" error={version.error} onRetry={() => void version.mutate()} />;
  if (!version.data) return <LoadingState label="Loading the procedure's cautions…" />;
  return (
    <View style={styles.wrap}>
      <Text testID="manual-first" variant="bodyStrong">
        {MANUAL_FIRST}
      </Text>
      <CautionList cautions={version.data.version.document.cautions} testID="procedure-cautions" />
      <FormError message={error} />
      <Button testID="start-diagnosis" variant="primary" icon="forward" label="I have read these. Start the first check" loading={starting} onPress={onStart} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
});
