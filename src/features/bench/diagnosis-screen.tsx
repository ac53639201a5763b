import { useKeepAwake } from 'expo-keep-awake';
import { useLocalSearchParams, useRouter } from 'expo-router';
import Head from 'expo-router/head';
import { useState } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Heading } from '@/components/ui/text';
import { space, useBreakpoints, useTheme } from '@/lib/theme';
import { CautionList } from './components/caution-list';
import { CheckStep } from './components/check-step';
import { ClosedDiagnosis } from './components/closed-diagnosis';
import { DiagnosisHeader } from './components/diagnosis-header';
import { PathList } from './components/path-list';
import { StepPhotos } from './components/step-photos';
import { StopDiagnosis } from './components/stop-diagnosis';
import { SyncStatus } from './components/sync-status';
import { useBenchDiagnosis } from './hooks/use-bench-diagnosis';
import type { PathStep } from './offline/local-path';

/**
 * Running a diagnosis at the bench, one check at a time. Opens where the diagnosis stands (on any device),
 * keeps the screen awake, and works on without signal from the device's copy and outbox.
 */
export function DiagnosisScreen() {
  useKeepAwake(undefined, { suppressDeactivateWarnings: true });
  const { id } = useLocalSearchParams<{ id: string }>();
  const bench = useBenchDiagnosis(id);
  const router = useRouter();
  const colors = useTheme();
  const { isWide } = useBreakpoints();
  const [view, setView] = useState<'check' | 'path'>('check');

  const { detail, local } = bench;
  if (!detail || !local) {
    return (
      <View style={[styles.fill, { backgroundColor: colors.background }]} testID="diagnosis-screen">
        {bench.error?.status === 404 ? (
          <EmptyState
            testID="diagnosis-missing"
            icon="unplugged"
            title="No such diagnosis in your shop"
            body="The link may be incomplete, or the diagnosis belongs to another shop. Open diagnoses are listed on your bench."
            action={{ label: 'Go to my bench', testID: 'diagnosis-missing-bench', onPress: () => router.navigate('/bench') }}
          />
        ) : bench.error ? (
          <ErrorState title="Can't open this diagnosis" error={bench.error} onRetry={bench.retryLoad} />
        ) : (
          <LoadingState label="Opening the diagnosis…" />
        )}
      </View>
    );
  }

  const liveSteps = local.steps.filter((s) => !s.retracted).length;
  const check = detail.document.checks.find((c) => c.id === local.currentCheckId);
  const titleOf = (checkId: string) => detail.document.checks.find((c) => c.id === checkId)?.title ?? checkId;
  const lastRecorded = [...local.steps].reverse().find((s) => !s.retracted);
  // Every recorded step shows its photos. The latest one, still at hand, takes new ones below the check;
  // on a phone also in the path, which replaces the check there.
  const photosOf = (step: PathStep) =>
    step.state === 'recorded' && step.seq !== null && !step.retracted ? (
      <StepPhotos diagnosisId={detail.id} stepId={step.key} name={String(step.seq)} of={titleOf(step.checkId)} canAdd={!isWide && detail.status === 'open' && step === lastRecorded} />
    ) : null;
  const path = (
    // Focusable, so a keyboard can scroll the path even before it holds a button.
    <ScrollView contentContainerStyle={styles.pathContent} testID="path-panel" tabIndex={0} aria-label="Path and cautions">
      <Heading level={2}>Path</Heading>
      <PathList document={detail.document} local={local} onDismissNotRecorded={bench.dismissNotRecorded} stepExtras={photosOf} />
      <Heading level={3}>Cautions for this procedure</Heading>
      <CautionList cautions={detail.document.cautions} testID="path-cautions" />
      {detail.status === 'open' ? <StopDiagnosis diagnosisId={detail.id} waiting={local.pendingCount} /> : null}
    </ScrollView>
  );

  let body;
  if (detail.status !== 'open') {
    body = <ClosedDiagnosis detail={detail} local={local} stepExtras={photosOf} />;
  } else if (!check) {
    body = <ErrorState title="This check is missing" error={new Error(`The procedure version has no check “${local.currentCheckId}”. Reload to see where the diagnosis stands.`)} onRetry={bench.retryLoad} />;
  } else {
    const step = (
      <CheckStep
        key={`${check.id}:${liveSteps}`}
        detail={detail}
        local={local}
        check={check}
        number={liveSteps + 1}
        onRecord={bench.record}
        onBack={liveSteps > 0 ? bench.back : null}
        status={
          <SyncStatus
            pending={local.waitingCount}
            offline={bench.offline}
            notRecorded={local.notRecorded.length}
            onSendNow={bench.sendNow}
            onShowPath={isWide ? null : () => setView('path')}
          />
        }
        footer={
          lastRecorded?.state === 'recorded' && lastRecorded.seq !== null ? (
            <StepPhotos
              diagnosisId={detail.id}
              stepId={lastRecorded.key}
              name={String(lastRecorded.seq)}
              of={titleOf(lastRecorded.checkId)}
              heading={`Photos of the last step: ${titleOf(lastRecorded.checkId)}`}
              canAdd
            />
          ) : null
        }
      />
    );
    body = isWide ? (
      <View style={[styles.fill, styles.row]}>
        <View style={styles.fill}>{step}</View>
        <View style={[styles.side, { borderLeftColor: colors.border, backgroundColor: colors.background }]}>{path}</View>
      </View>
    ) : view === 'path' ? (
      path
    ) : (
      step
    );
  }

  return (
    <View style={[styles.fill, { backgroundColor: colors.background }]} testID="diagnosis-screen">
      <Head>
        <title>{`${check?.title ?? 'Diagnosis'} · ${detail.machine} · Probepath`}</title>
      </Head>
      <DiagnosisHeader detail={detail} steps={liveSteps} view={view} onToggle={isWide || detail.status !== 'open' ? null : () => setView(view === 'path' ? 'check' : 'path')} />
      {body}
    </View>
  );
}

const styles = StyleSheet.create({
  fill: { flex: 1 },
  row: { flexDirection: 'row' },
  side: { width: 420, borderLeftWidth: 1 },
  pathContent: { padding: space.lg, gap: space.lg },
});
