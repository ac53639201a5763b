import { EmptyState } from '@/components/ui/empty-state';
import { Screen } from '@/components/ui/screen';

export function ReplaysScreen() {
  return (
    <Screen testID="replays-screen" title="Replays" subtitle="Concluded diagnoses, step by step.">
      <EmptyState
        icon="replays"
        title="Nothing to replay yet"
        body="Each diagnosis appears here once it is concluded, to replay check by check: every reading, verdict and note in the order they were taken, down to the finding."
      />
    </Screen>
  );
}
