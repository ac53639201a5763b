import { useRouter } from 'expo-router';
import { useEffect, useMemo } from 'react';
import { StyleSheet, View } from 'react-native';
import type { DiagnosisSummary } from '@shared/api/diagnosis-types';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { Heading, Text } from '@/components/ui/text';
import { useDiagnoses } from '@/hooks/use-diagnoses';
import { useUser } from '@/lib/session';
import { space, useBreakpoints, useTheme } from '@/lib/theme';
import { ConcludedDiagnosisCard, OpenDiagnosisCard } from './components/diagnosis-cards';
import { useStepOutbox } from './hooks/use-step-outbox';
import { forgetClosedCopies } from './offline/diagnosis-copy';
import { unsentCount } from './offline/step-outbox';

const RECENT = 6;

/** "My bench": open diagnoses to pick up, the latest concluded ones, and the way to start a new one. */
export function BenchScreen() {
  const user = useUser();
  const router = useRouter();
  const colors = useTheme();
  const { isWide } = useBreakpoints();
  const open = useDiagnoses('open');
  const concluded = useDiagnoses('concluded');
  const outbox = useStepOutbox(user.id);

  const openList = open.data?.diagnoses;
  useEffect(() => {
    if (openList) forgetClosedCopies(user.id, openList.map((d) => d.id));
  }, [openList, user.id]);

  const [mine, others] = useMemo(() => {
    const all = openList ?? [];
    return [all.filter((d) => d.startedBy === user.name), all.filter((d) => d.startedBy !== user.name)];
  }, [openList, user.name]);
  const recent = concluded.data?.diagnoses.slice(0, RECENT) ?? [];

  const start = () => router.push('/bench/start');
  const startButton = <Button testID="bench-start" variant="primary" icon="plus" label="Start a diagnosis" onPress={start} />;

  const openCard = (d: DiagnosisSummary) => (
    <OpenDiagnosisCard key={d.id} diagnosis={d} pending={unsentCount(outbox, d.id)} onResume={() => router.push(`/bench/diagnosis/${d.id}`)} />
  );

  let body;
  if (open.error || concluded.error) {
    body = (
      <ErrorState
        title="Can't load your bench"
        error={(open.error ?? concluded.error)!}
        onRetry={() => {
          void open.mutate();
          void concluded.mutate();
        }}
      />
    );
  } else if (!open.data || !concluded.data) {
    body = <LoadingState label="Loading your bench…" />;
  } else if (!openList?.length && !recent.length) {
    body = (
      <EmptyState
        icon="bench"
        title="Nothing on the bench yet"
        body="When a machine comes in, start a diagnosis from a published procedure. Open ones wait here to be picked up again, on this phone or any other."
      />
    );
  } else {
    body = (
      <>
        <Section title="Yours, open" testID="bench-open-mine" empty="Nothing of yours is open. Start a diagnosis when the next machine comes in.">
          {mine.map(openCard)}
        </Section>
        {others.length ? (
          <Section title="Open in the shop" testID="bench-open-others">
            {others.map(openCard)}
          </Section>
        ) : null}
        <Section title="Recently concluded" testID="bench-concluded" empty="Concluded diagnoses appear here with their finding and report.">
          {recent.map((d) => (
            <ConcludedDiagnosisCard
              key={d.id}
              diagnosis={d}
              onOpen={() => router.push(`/bench/diagnosis/${d.id}`)}
              onReport={() => router.push(`/report/${d.id}`)}
            />
          ))}
        </Section>
      </>
    );
  }

  return (
    <View style={[styles.fill, { backgroundColor: colors.background }]}>
      <Screen testID="bench-screen" title="My bench" subtitle="Diagnoses to pick up, the latest concluded, and a new one to start." actions={isWide ? startButton : undefined}>
        {body}
      </Screen>
      {isWide ? null : <View style={[styles.footer, { backgroundColor: colors.surface, borderTopColor: colors.border }]}>{startButton}</View>}
    </View>
  );
}

function Section({ title, testID, empty, children }: { title: string; testID: string; empty?: string; children: React.ReactNode[] }) {
  return (
    <View testID={testID} style={styles.section}>
      <Heading level={2}>{title}</Heading>
      {children.length ? (
        <View style={styles.cards}>{children}</View>
      ) : (
        <Text tone="textMuted">{empty}</Text>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  fill: { flex: 1 },
  section: { gap: space.md },
  cards: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  footer: { padding: space.md, borderTopWidth: 1 },
});
