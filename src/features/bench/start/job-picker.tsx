import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { JobListItem, JobView } from '@shared/api/workshop-types';
import { Button } from '@/components/ui/button';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { SearchField } from '@/components/ui/search-field';
import { Text } from '@/components/ui/text';
import { useJobs } from '@/hooks/use-jobs';
import { formatDate } from '@/lib/format';
import { radius, space, useTheme } from '@/lib/theme';
import { machineName } from './machine-name';

const SHOWN = 12;

/**
 * Step 1: the job on the bench, found by customer, machine, work order or complaint; or a new one. Jobs
 * still waiting for a finding come first; those already diagnosed say when, and stay pickable (a comeback,
 * a second fault).
 */
export function JobPicker({ onPick, onNew }: { onPick: (job: JobView) => void; onNew: () => void }) {
  const colors = useTheme();
  const jobs = useJobs();
  const [filter, setFilter] = useState('');
  const shown = useMemo(() => {
    const words = filter.toLowerCase().split(/\s+/).filter(Boolean);
    const all = jobs.data?.jobs ?? [];
    const matching = words.length ? all.filter((j) => words.every((w) => haystack(j).includes(w))) : all;
    return waitingFirst(matching).slice(0, SHOWN);
  }, [jobs.data, filter]);

  if (jobs.error) return <ErrorState title="Can't load the jobs" error={jobs.error} onRetry={() => void jobs.mutate()} />;
  if (!jobs.data) return <LoadingState label="Loading jobs…" />;

  return (
    <View style={styles.wrap}>
      <Button testID="start-new-job" variant="primary" icon="plus" label="New job and machine" onPress={onNew} />
      <SearchField testID="start-job-filter" label="Or pick a job" placeholder="Customer, machine, work order…" value={filter} onChange={setFilter} />
      <View role="list" style={[styles.list, { borderColor: colors.border }]}>
        {shown.map((j) => (
          <View role="listitem" key={j.id} style={{ borderBottomColor: colors.border, borderBottomWidth: 1 }}>
            <Button
              testID={`start-job-${j.id}`}
              variant="row"
              label={`${j.customerName} · ${machineName(j.machine)}`}
              description={`${j.reference ? `${j.reference} · ` : ''}“${j.complaint}”${j.concludedAt ? ` · diagnosed ${formatDate(j.concludedAt)}` : ''}`}
              onPress={() => onPick(j)}
            />
          </View>
        ))}
        {shown.length ? null : (
          <Text tone="textMuted" style={styles.none}>
            No job matches “{filter}”. Try fewer words, or open a new job.
          </Text>
        )}
      </View>
    </View>
  );
}

/** Jobs without a concluded diagnosis first, each group keeping the server's newest-first order. */
function waitingFirst(jobs: JobListItem[]): JobListItem[] {
  return [...jobs.filter((j) => !j.concludedAt), ...jobs.filter((j) => j.concludedAt)];
}

function haystack(j: JobView): string {
  return [j.customerName, j.reference, j.complaint, j.machine.make, j.machine.model, j.machine.vin].join(' ').toLowerCase();
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  list: { borderWidth: 1, borderRadius: radius.lg, overflow: 'hidden' },
  none: { padding: space.lg },
});
