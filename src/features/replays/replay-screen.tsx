import Head from 'expo-router/head';
import { useLocalSearchParams, useRouter } from 'expo-router';
import { useMemo, useRef, useState } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import type { DiagnosisDetail } from '@shared/api/diagnosis-types';
import type { PracticeResult, StepCommentView } from '@shared/api/replay-types';
import { practiceQuestions } from '@shared/practice/questions';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Text } from '@/components/ui/text';
import { FindingPanel } from '@/features/replays/components/finding-panel';
import { PracticePrompt } from '@/features/replays/components/practice-prompt';
import { PracticeSummary } from '@/features/replays/components/practice-summary';
import { ProcedureDiagram } from '@/features/replays/components/procedure-diagram';
import { ReplayHeader } from '@/features/replays/components/replay-header';
import { StepComments } from '@/features/replays/components/step-comments';
import { StepPanel } from '@/features/replays/components/step-panel';
import { earlierReadings, replayPath, stepDurations } from '@/features/replays/replay-path';
import { STEP_KEYS, stepKeyOf } from '@/features/replays/step-keys';
import { useShortcutKeys } from '@/lib/use-shortcut-keys';
import { useAnswerPractice } from '@/hooks/use-practice';
import { useReplay, useStepComments } from '@/hooks/use-replays';
import { layoutProcedure } from '@/lib/procedure-layout';
import { randomUuid } from '@/lib/random-uuid';
import { useUser } from '@/lib/session';
import { layout, space, useBreakpoints, useTheme } from '@/lib/theme';

/** A concluded diagnosis replayed one step at a time; `?mode=practice` asks before each step is revealed. */
export function ReplayScreen() {
  const { id, mode } = useLocalSearchParams<{ id: string; mode?: string }>();
  const router = useRouter();
  const colors = useTheme();
  const replay = useReplay(id);
  const comments = useStepComments(id);
  const practice = mode === 'practice';

  let body;
  if (replay.error?.status === 404) {
    body = (
      <EmptyState
        testID="replay-not-found"
        icon="replays"
        title="This replay isn't here"
        body="It may belong to another shop, or still be in progress: only concluded diagnoses can be replayed. Pick one from the list."
        action={{ label: 'All replays', testID: 'replay-not-found-back', onPress: () => router.navigate('/replays') }}
      />
    );
  } else if (replay.error) {
    body = <ErrorState title="This replay can't be shown" error={replay.error} onRetry={() => void replay.mutate()} />;
  } else if (!replay.data) {
    body = <LoadingState label="Loading the replay…" />;
  } else {
    body = (
      <ReplayViewer
        key={`${id}-${practice}`}
        diagnosis={replay.data.diagnosis}
        comments={comments.data?.comments ?? []}
        practice={practice}
        onMode={(next) => router.setParams({ mode: next ? 'practice' : 'watch' })}
      />
    );
  }
  return (
    <View testID="replay-screen" style={[styles.fill, { backgroundColor: colors.background }]}>
      <Head>
        <title>{`${replay.data ? replay.data.diagnosis.procedureTitle : 'Replay'} · Probepath`}</title>
      </Head>
      {body}
    </View>
  );
}

interface ViewerProps {
  diagnosis: DiagnosisDetail;
  comments: StepCommentView[];
  practice: boolean;
  onMode: (practice: boolean) => void;
}

function ReplayViewer({ diagnosis, comments, practice, onMode }: ViewerProps) {
  const router = useRouter();
  const user = useUser();
  const colors = useTheme();
  const { isDesk, isWide } = useBreakpoints();
  const scroll = useRef<ScrollView>(null);
  const [index, setIndex] = useState(0);
  const [runId, setRunId] = useState(randomUuid);
  const [results, setResults] = useState<Record<number, PracticeResult>>({});
  const [answerError, setAnswerError] = useState<string | null>(null);
  const [diagramOpen, setDiagramOpen] = useState(false);
  const answer = useAnswerPractice();

  const { document, steps } = diagnosis;
  const checkOf = (id: string | null) => document.checks.find((c) => c.id === id);
  const diagram = useMemo(() => layoutProcedure(document), [document]);
  const durations = useMemo(() => stepDurations(diagnosis.startedAt, steps), [diagnosis.startedAt, steps]);
  const questions = useMemo(() => steps.map((s) => (practice ? (practiceQuestions(document, s)[0] ?? null) : null)), [document, steps, practice]);
  const atEnd = index === steps.length;
  const step = atEnd ? null : steps[index];
  const question = atEnd ? null : questions[index];
  const result = step ? (results[step.seq] ?? null) : null;
  const revealed = !question || result !== null;
  const findingId = diagnosis.conclusion?.findingCheckId ?? null;

  const go = (next: number) => {
    setIndex(next);
    setAnswerError(null);
    scroll.current?.scrollTo({ y: 0, animated: false });
  };

  const submit = async (value: string) => {
    if (!step || !question) return;
    setAnswerError(null);
    try {
      const scored = await answer.trigger({ runId, diagnosisId: diagnosis.id, stepSeq: step.seq, asked: question.asked, answer: value });
      setResults((r) => ({ ...r, [step.seq]: scored }));
    } catch (e) {
      setAnswerError((e as Error).message);
    }
  };

  const again = () => {
    setRunId(randomUuid());
    setResults({});
    go(0);
  };

  const path = replayPath(steps, atEnd ? steps.length - 1 : revealed ? index : index - 1);
  const currentId = step ? step.checkId : findingId;
  const visitedTitles = steps.filter((s) => !s.retracted).map((s) => checkOf(s.checkId)?.title ?? s.checkId);
  const diagramView = (height?: number) => (
    <ProcedureDiagram
      layout={diagram}
      path={path}
      currentId={currentId}
      currentTag={atEnd ? 'Finding' : `Step ${index + 1}`}
      height={height}
      summary={`Procedure diagram, ${document.checks.length} checks. The path: ${visitedTitles.join(', ')}, then ${checkOf(findingId)?.title ?? 'the finding'}. On screen: ${checkOf(currentId)?.title ?? ''}.`}
    />
  );

  const panel = step ? (
    <StepPanel
      step={step}
      check={checkOf(step.checkId)!}
      position={index + 1}
      total={steps.length}
      spentMs={durations[index]}
      earlier={earlierReadings(steps, index)}
      meterRanges={diagnosis.meter.ranges}
      nextTitle={checkOf(step.nextCheckId)?.title ?? null}
      revealed={revealed}
      photos={diagnosis.photos.filter((p) => p.stepId === step.id)}
      prompt={question ? <PracticePrompt question={question} result={result} onAnswer={(v) => void submit(v)} busy={answer.isMutating} error={answerError} /> : null}
    >
      {revealed ? (
        <StepComments diagnosisId={diagnosis.id} seq={step.seq} comments={comments.filter((c) => c.stepSeq === step.seq)} canComment={user.role === 'lead' || user.role === 'owner'} />
      ) : null}
    </StepPanel>
  ) : (
    <FindingPanel diagnosis={diagnosis}>
      {practice ? (
        <PracticeSummary
          results={steps.flatMap((s, i) => (results[s.seq] ? [{ title: checkOf(s.checkId)?.title ?? s.checkId, position: i + 1, result: results[s.seq] }] : []))}
          asked={questions.filter(Boolean).length}
          onAgain={again}
          onHistory={() => router.navigate('/replays/practice')}
        />
      ) : null}
    </FindingPanel>
  );

  // Keys do what the buttons do, and no more: Next waits for an answer, End does not skip practice questions.
  const canNext = !atEnd && revealed;
  useShortcutKeys(stepKeyOf, {
    previous: () => index > 0 && go(index - 1),
    next: () => canNext && go(index + 1),
    first: () => index > 0 && go(0),
    finding: () => !practice && !atEnd && go(steps.length),
  });

  const header = <ReplayHeader diagnosis={diagnosis} practice={practice} onMode={onMode} onBack={() => router.navigate('/replays')} compact={!isDesk && index > 0} />;
  const nav = <StepNav index={index} steps={steps.length} waiting={!revealed} onGo={go} keysShown={isWide} practice={practice} />;

  if (isDesk) {
    return (
      <View style={[styles.fill, styles.row]}>
        <View style={styles.fill}>
          <ScrollView ref={scroll} contentContainerStyle={styles.deskScroll}>
            <View style={styles.deskColumn}>
              {header}
              {panel}
            </View>
          </ScrollView>
          {nav}
        </View>
        <View style={[styles.side, { borderLeftColor: colors.border, backgroundColor: colors.surface }]}>
          <Text variant="label" tone="textMuted">
            PROCEDURE DIAGRAM
          </Text>
          {diagramView()}
        </View>
      </View>
    );
  }

  return (
    <View style={styles.fill}>
      <ScrollView ref={scroll} contentContainerStyle={[styles.phoneScroll, { padding: isWide ? space.xxl : space.lg }]}>
        <View style={styles.phoneColumn}>
          {header}
          {panel}
          <View style={[styles.diagramSection, { borderTopColor: colors.border }]}>
            <Button
              testID="replay-diagram-toggle"
              label={diagramOpen ? 'Hide the procedure diagram' : 'Show the procedure diagram'}
              icon="procedures"
              selected={diagramOpen}
              onPress={() => setDiagramOpen((o) => !o)}
            />
            {diagramOpen ? diagramView(440) : null}
          </View>
        </View>
      </ScrollView>
      {nav}
    </View>
  );
}

interface StepNavProps {
  index: number;
  /** Steps on the path; one more frame follows them: the finding. */
  steps: number;
  /** A practice question is open: Next waits for the answer. */
  waiting: boolean;
  onGo: (index: number) => void;
  /** Where a keyboard is likely (tablet and desk), the shortcuts are named under the buttons. */
  keysShown: boolean;
  practice: boolean;
}

/** Previous and Next in thumb reach, always at the bottom of the screen. */
function StepNav({ index, steps, waiting, onGo, keysShown, practice }: StepNavProps) {
  const colors = useTheme();
  const end = index === steps;
  const keys = STEP_KEYS.filter((k) => !(practice && k.action === 'finding'));
  return (
    <View style={[styles.navFrame, { borderTopColor: colors.border, backgroundColor: colors.surface }]} role="navigation" aria-label="Steps">
      <View style={styles.nav}>
        <Button testID="replay-previous" label="Previous" icon="back" disabled={index === 0} onPress={() => onGo(index - 1)} style={styles.navButton} />
        <View style={styles.navCount} testID="replay-count">
          <Text variant="label" tone="textMuted">
            {end ? 'THE END' : 'STEP'}
          </Text>
          <Text variant="bodyStrong">{end ? 'Finding' : `${index + 1} of ${steps}`}</Text>
        </View>
        <Button
          testID="replay-next"
          label={waiting ? 'Answer first' : index === steps - 1 ? 'To the finding' : 'Next step'}
          variant="primary"
          disabled={end || waiting}
          onPress={() => onGo(index + 1)}
          style={styles.navButton}
        />
      </View>
      {keysShown ? (
        <Text testID="replay-keys" variant="small" tone="textMuted" style={styles.keys}>
          {`Keys: ${keys.map((k) => `${k.shown} ${k.does}`).join(' · ')}`}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  fill: { flex: 1 },
  row: { flexDirection: 'row' },
  deskScroll: { padding: space.xxl },
  deskColumn: { width: '100%', maxWidth: 720, alignSelf: 'center', gap: space.xl },
  side: { width: '44%', maxWidth: 640, borderLeftWidth: 1, padding: space.xl, gap: space.sm },
  phoneScroll: { flexGrow: 1 },
  phoneColumn: { width: '100%', maxWidth: layout.maxFormWidth + 200, alignSelf: 'center', gap: space.xl },
  diagramSection: { borderTopWidth: 1, paddingTop: space.lg, gap: space.md },
  navFrame: { borderTopWidth: 1, paddingHorizontal: space.lg, paddingVertical: space.sm, gap: space.xs },
  nav: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  keys: { textAlign: 'center' },
  navButton: { flex: 1, minHeight: 56 },
  navCount: { minWidth: 64, alignItems: 'center' },
});
