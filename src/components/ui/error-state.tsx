import { EmptyState } from '@/components/ui/empty-state';

/** A failed load, in words, with a way to try again. */
export function ErrorState({ title, error, onRetry }: { title: string; error: Error; onRetry: () => void }) {
  return (
    <EmptyState
      testID="error-state"
      icon="alert"
      title={title}
      body={error.message}
      action={{ label: 'Try again', onPress: onRetry, testID: 'retry' }}
    />
  );
}
