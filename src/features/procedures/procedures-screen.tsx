import { EmptyState } from '@/components/ui/empty-state';
import { Screen } from '@/components/ui/screen';

export function ProceduresScreen() {
  return (
    <Screen testID="procedures-screen" title="Procedures" subtitle="Check sequences, written once and followed at the bench.">
      <EmptyState
        icon="procedures"
        title="No procedures yet"
        body="Procedures appear here: drafts being written, published versions ready for the bench, and retired ones kept for reference. A lead technician writes them, best on a wide screen."
      />
    </Screen>
  );
}
