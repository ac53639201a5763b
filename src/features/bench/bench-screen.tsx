import { EmptyState } from '@/components/ui/empty-state';
import { Screen } from '@/components/ui/screen';
import { useUser } from '@/lib/session';

export function BenchScreen() {
  const user = useUser();
  return (
    <Screen testID="bench-screen" title="Bench" subtitle={`Diagnoses open in ${user.shopName}.`}>
      <EmptyState
        icon="bench"
        title="No diagnoses open"
        body="Open diagnoses appear here with the machine, the complaint and the check each one is on. Start one from a published procedure when a machine comes in."
      />
    </Screen>
  );
}
