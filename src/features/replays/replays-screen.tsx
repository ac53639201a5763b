import { useRouter } from 'expo-router';
import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { DiagnosisSummary } from '@shared/api/diagnosis-types';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { type Column, Table } from '@/components/ui/table';
import { Text } from '@/components/ui/text';
import { ReplayFilterBar } from '@/features/replays/components/replay-filter-bar';
import { filterOptions, filterReplays, NO_FILTERS, type ReplayFilters } from '@/features/replays/replay-filters';
import { useReplayList } from '@/hooks/use-replays';
import { formatDate } from '@/lib/format';
import { useUser } from '@/lib/session';
import { space, useBreakpoints } from '@/lib/theme';

/** Concluded diagnoses to learn from: filter them, then watch one or practise on it. */
export function ReplaysScreen() {
  const router = useRouter();
  const user = useUser();
  const team = user.role === 'lead' || user.role === 'owner';
  return (
    <Screen
      testID="replays-screen"
      title="Replays"
      subtitle="Concluded diagnoses, step by step: watch the path a technician took, or practise making the calls yourself."
      actions={
        <View style={styles.actions}>
          <Button testID="replays-practice-history" label={team ? 'Team practice' : 'My practice'} icon="check" onPress={() => router.navigate('/replays/practice')} />
          {team ? <Button testID="replays-insight" label="Insight" icon="procedures" onPress={() => router.navigate('/replays/insight')} /> : null}
        </View>
      }
    >
      <ReplayList />
    </Screen>
  );
}

function ReplayList() {
  const list = useReplayList();
  const router = useRouter();
  const { isDesk } = useBreakpoints();
  const [filters, setFilters] = useState<ReplayFilters>(NO_FILTERS);
  const all = list.data?.diagnoses;
  const options = useMemo(() => filterOptions(all ?? []), [all]);
  const shown = useMemo(() => filterReplays(all ?? [], filters), [all, filters]);

  if (list.error) return <ErrorState title="Couldn't load the replays" error={list.error} onRetry={() => void list.mutate()} />;
  if (!all) return <LoadingState label="Loading replays…" />;
  if (all.length === 0) {
    return (
      <EmptyState
        icon="replays"
        title="Nothing to replay yet"
        body="Each diagnosis appears here once it is concluded, to replay check by check: every reading, verdict and note in the order they were taken, down to the finding."
      />
    );
  }

  const open = (d: DiagnosisSummary, practice: boolean) => router.navigate(`/replays/${d.id}${practice ? '?mode=practice' : ''}`);
  const actions = (d: DiagnosisSummary) => (
    <View style={styles.actions}>
      <Button testID={`replay-watch-${d.id}`} label="Watch" ariaLabel={`Watch the replay of ${d.procedureTitle} on the ${d.machine}`} icon="replays" onPress={() => open(d, false)} />
      <Button testID={`replay-practise-${d.id}`} label="Practise" ariaLabel={`Practise on ${d.procedureTitle} on the ${d.machine}`} variant="primary" onPress={() => open(d, true)} />
    </View>
  );
  const columns: Column<DiagnosisSummary>[] = [
    { title: 'Concluded', flex: 0.9, render: (d) => <Text>{formatDate(d.endedAt ?? d.startedAt)}</Text> },
    { title: 'Procedure', flex: 1.6, render: (d) => <Title d={d} /> },
    { title: 'Machine', flex: 1.3, render: (d) => <Text>{d.machine}</Text> },
    { title: 'Technician', flex: 1.1, render: (d) => <Text>{d.startedBy}</Text> },
    { title: 'Finding', flex: 1.4, render: (d) => <Text variant="bodyStrong">{d.finding ?? '—'}</Text> },
    { title: 'Steps', flex: 0.5, render: (d) => <Text>{String(d.stepCount)}</Text> },
    { title: 'Replay', flex: 1.9, render: actions },
  ];

  return (
    <View style={styles.section}>
      <ReplayFilterBar filters={filters} options={options} onChange={setFilters} />
      <Text tone="textMuted" role="status" aria-live="polite" testID="replays-count">
        {shown.length === all.length ? `${all.length} concluded ${all.length === 1 ? 'diagnosis' : 'diagnoses'}` : `${shown.length} of ${all.length} match the filters`}
      </Text>
      {shown.length === 0 ? (
        <EmptyState
          testID="replays-no-match"
          icon="replays"
          title="No replay matches"
          body="Nothing concluded fits all of these filters. Loosen one, or clear them all."
          action={{ label: 'Clear filters', testID: 'replays-clear', onPress: () => setFilters(NO_FILTERS) }}
        />
      ) : isDesk ? (
        <Table label="Replays" testID="replays-table" columns={columns} rows={shown} rowKey={(d) => d.id} />
      ) : (
        <View style={styles.section} testID="replays-cards">
          {shown.map((d) => (
            <Card key={d.id} testID={`replay-card-${d.id}`}>
              <Title d={d} />
              <Text>{d.machine}</Text>
              {d.finding ? <Badge label={`Finding: ${d.finding}`} tone="primary" icon="check" /> : null}
              <Text variant="small" tone="textMuted">{`${d.startedBy} · ${formatDate(d.endedAt ?? d.startedAt)} · ${d.stepCount} steps`}</Text>
              {actions(d)}
            </Card>
          ))}
        </View>
      )}
    </View>
  );
}

function Title({ d }: { d: DiagnosisSummary }) {
  return (
    <View style={styles.title}>
      <Text variant="bodyStrong">{d.procedureTitle}</Text>
      <Text variant="small" tone="textMuted">{`“${d.complaint}” · v${d.versionNumber}`}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.lg },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  title: { gap: 2 },
});
