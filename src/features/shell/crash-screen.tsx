import type { ErrorBoundaryProps } from 'expo-router';
import { ScrollView, StyleSheet } from 'react-native';
import { EmptyState } from '@/components/ui/empty-state';
import { useTheme } from '@/lib/theme';

/** What a screen shows when it throws while drawing: the error in words and a way back. */
export function CrashScreen({ error, retry }: ErrorBoundaryProps) {
  const colors = useTheme();
  return (
    <ScrollView style={{ backgroundColor: colors.background }} contentContainerStyle={styles.center}>
      <EmptyState
        testID="crash-screen"
        icon="alert"
        title="This screen stopped working"
        body={`${error.message} Anything already saved is kept. Try again; if it keeps happening, reload the page.`}
        action={{ label: 'Try again', testID: 'crash-retry', onPress: () => void retry() }}
      />
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  center: { flexGrow: 1, justifyContent: 'center' },
});
