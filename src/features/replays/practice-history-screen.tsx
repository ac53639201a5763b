import { useRouter } from 'expo-router';
import { useMemo } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { type Column, Table } from '@/components/ui/table';
import { Heading, Text } from '@/components/ui/text';
import { type MemberPractice, percent, practiceByMember, practiceRuns, type PracticeRun } from '@/features/replays/practice-runs';
import { usePracticeAttempts } from '@/hooks/use-practice';
import { formatDateTime } from '@/lib/format';
import { useUser } from '@/lib/session';
import { space, useBreakpoints } from '@/lib/theme';

/** Practice passes and scores: an apprentice's own, or the whole team's for a lead or owner. */
export function PracticeHistoryScreen() {
  const user = useUser();
  const router = useRouter();
  const team = user.role === 'lead' || user.role === 'owner';
  return (
    <Screen
      testID="practice-history-screen"
      title={team ? 'Team practice' : 'My practice'}
      subtitle={team ? 'How everyone in the shop scores when they practise on replays.' : 'Your practice passes on replays, scored by the server.'}
      actions={<Button testID="practice-to-replays" label="All replays" icon="back" variant="quiet" onPress={() => router.navigate('/replays')} />}
    >
      <History team={team} />
    </Screen>
  );
}

function History({ team }: { team: boolean }) {
  const attempts = usePracticeAttempts();
  const router = useRouter();
  const { isDesk } = useBreakpoints();
  const runs = useMemo(() => practiceRuns(attempts.data?.attempts ?? []), [attempts.data]);

  if (attempts.error) return <ErrorState title="Couldn't load the practice history" error={attempts.error} onRetry={() => void attempts.mutate()} />;
  if (!attempts.data) return <LoadingState label="Loading practice…" />;
  if (runs.length === 0) {
    return (
      <EmptyState
        testID="practice-empty"
        icon="replays"
        title="No practice yet"
        body={team ? 'When someone practises on a replay, every answer and its score shows up here.' : 'Open a replay and press Practise: before each step is revealed you make the call, and your score lands here.'}
        action={{ label: 'Go to Replays', testID: 'practice-empty-replays', onPress: () => router.navigate('/replays') }}
      />
    );
  }

  const right = runs.reduce((n, r) => n + r.right, 0);
  const answered = runs.reduce((n, r) => n + r.answered, 0);
  const again = (r: PracticeRun) => (
    <Button testID={`practice-run-again-${r.runId}`} label="Practise again" ariaLabel={`Practise again on ${r.procedureTitle}`} onPress={() => router.navigate(`/replays/${r.diagnosisId}?mode=practice`)} />
  );
  const columns: Column<PracticeRun>[] = [
    { title: 'When', flex: 1.1, render: (r) => <Text>{formatDateTime(r.startedAt)}</Text> },
    ...(team ? [{ title: 'Who', flex: 1, render: (r: PracticeRun) => <Text variant="bodyStrong">{r.userName}</Text> }] : []),
    { title: 'Replay', flex: 2, render: (r) => <RunTitle run={r} /> },
    { title: 'Score', flex: 0.8, render: (r) => <Score run={r} /> },
    { title: 'Again', flex: 1.1, render: again },
  ];
  const memberColumns: Column<MemberPractice>[] = [
    { title: 'Member', flex: 1.4, render: (m) => <Text variant="bodyStrong">{m.userName}</Text> },
    { title: 'Passes', flex: 0.7, render: (m) => <Text>{String(m.runs)}</Text> },
    { title: 'Right', flex: 1, render: (m) => <Text>{`${m.right} of ${m.answered} · ${percent(m.right, m.answered)}`}</Text> },
    { title: 'Last practised', flex: 1.3, render: (m) => <Text>{formatDateTime(m.lastAt)}</Text> },
  ];

  return (
    <View style={styles.section}>
      <Text variant="bodyStrong" testID="practice-total">{`${runs.length} ${runs.length === 1 ? 'pass' : 'passes'} · ${right} of ${answered} answers right (${percent(right, answered)})`}</Text>
      {team ? (
        <View style={styles.section}>
          <Heading level={2}>By member</Heading>
          <Table label="Practice by member" testID="practice-members" columns={memberColumns} rows={practiceByMember(runs)} rowKey={(m) => m.userId} />
        </View>
      ) : null}
      <Heading level={2}>Passes</Heading>
      {isDesk ? (
        <Table label="Practice passes" testID="practice-runs" columns={columns} rows={runs} rowKey={(r) => r.runId} />
      ) : (
        <View style={styles.section} testID="practice-run-cards">
          {runs.map((r) => (
            <Card key={r.runId} testID={`practice-run-${r.runId}`}>
              <View style={styles.cardHead}>
                <RunTitle run={r} />
                <Score run={r} />
              </View>
              <Text variant="small" tone="textMuted">{team ? `${r.userName} · ${formatDateTime(r.startedAt)}` : formatDateTime(r.startedAt)}</Text>
              {again(r)}
            </Card>
          ))}
        </View>
      )}
    </View>
  );
}

function RunTitle({ run }: { run: PracticeRun }) {
  return (
    <View style={styles.title}>
      <Text variant="bodyStrong">{run.procedureTitle}</Text>
      <Text variant="small" tone="textMuted">
        {run.machine}
      </Text>
    </View>
  );
}

function Score({ run }: { run: PracticeRun }) {
  return (
    <Text variant="title" style={styles.score} aria-label={`${run.right} of ${run.answered} right`}>
      {`${run.right}/${run.answered}`}
    </Text>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.lg },
  title: { flexShrink: 1, gap: 2 },
  cardHead: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'flex-start', gap: space.md },
  score: { fontVariant: ['tabular-nums'] },
});
