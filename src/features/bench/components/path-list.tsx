import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import type { Check, ProcedureDocument } from '@shared/engine/procedure';
import { SpecBar } from '@/components/spec-bar/spec-bar';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Heading, Text } from '@/components/ui/text';
import { VerdictChip } from '@/components/verdict/verdict-mark';
import { layout, radius, space, useTheme } from '@/lib/theme';
import type { LocalDiagnosis, PathStep } from '../offline/local-path';

/**
 * The path so far, oldest first: every step with what was read or picked, its verdict and note. A step
 * taken back stays, struck through; a step still on this device says so.
 */
export function PathList({ document, local, onDismissNotRecorded, stepExtras }: { document: ProcedureDocument; local: LocalDiagnosis; onDismissNotRecorded?: () => void; stepExtras?: (step: PathStep) => ReactNode }) {
  const checks = new Map(document.checks.map((c) => [c.id, c]));
  let number = 0;
  return (
    <View testID="path-list" style={styles.wrap}>
      {local.steps.length === 0 ? <Text tone="textMuted">No steps yet. Each check you record appears here.</Text> : null}
      <View role="list" aria-label="Path" style={styles.list}>
        {local.steps.map((step) => {
          if (!step.retracted) number++;
          return <PathRow key={step.key} step={step} check={checks.get(step.checkId)} number={step.retracted ? null : number} extras={stepExtras?.(step)} />;
        })}
      </View>
      {local.notRecorded.length ? (
        <View testID="not-recorded" style={styles.list}>
          <Heading level={3}>Not recorded</Heading>
          <Text variant="small" tone="textMuted">
            The server did not take these. What you typed is kept here so you can enter it again where the diagnosis now stands.
          </Text>
          {local.notRecorded.map((step) => (
            <PathRow key={step.key} step={step} check={checks.get(step.checkId)} number={null} />
          ))}
          {onDismissNotRecorded ? <Button testID="dismiss-not-recorded" label="I've seen these, clear them" onPress={onDismissNotRecorded} style={styles.tall} /> : null}
        </View>
      ) : null}
    </View>
  );
}

function PathRow({ step, check, number, extras }: { step: PathStep; check: Check | undefined; number: number | null; extras?: ReactNode }) {
  const colors = useTheme();
  const struck = step.retracted ? styles.struck : null;
  const answer =
    step.readingText ?? (step.choiceId && check?.kind === 'observe' ? check.choices.find((c) => c.id === step.choiceId)?.label : null) ?? (check?.kind === 'task' ? 'Done' : null);
  return (
    <View
      role="listitem"
      testID={`path-step-${step.seq ?? step.key}`}
      aria-label={step.retracted ? `Taken back: ${check?.title ?? step.checkId}` : undefined}
      style={[styles.row, { backgroundColor: step.retracted ? colors.surfaceSunken : colors.surface, borderColor: colors.border }, step.retracted ? styles.dashed : null]}
    >
      <View style={styles.head}>
        <Text variant="label" tone="textMuted" style={styles.number}>
          {number === null ? '—' : number}
        </Text>
        <Text variant="bodyStrong" style={[styles.title, struck]} testID="path-step-title">
          {check?.title ?? step.checkId}
        </Text>
      </View>
      <View style={styles.facts}>
        {answer ? (
          <Text variant={step.readingText ? 'mono' : 'body'} style={[step.readingText ? styles.reading : null, struck]} testID="path-step-answer">
            {answer}
          </Text>
        ) : null}
        {step.verdict ? <VerdictChip verdict={step.verdict} /> : null}
        {step.retracted ? <Badge label={step.retractionPending ? 'Taken back · waiting to send' : 'Taken back'} icon="back" /> : null}
        {step.state === 'pending' ? <Badge tone="warning" icon="pending" label="Pending · on this phone" /> : null}
        {step.state === 'not_recorded' ? <Badge tone="danger" icon="alert" label="Not recorded" /> : null}
      </View>
      {check?.kind === 'measure' && step.evaluation && !step.retracted ? (
        <SpecBar spec={check.spec} quantity={check.quantity} evaluation={step.evaluation} size="compact" testID="path-spec-bar" />
      ) : null}
      {step.note ? (
        <Text variant="small" tone="textMuted" style={struck}>
          Note: {step.note}
        </Text>
      ) : null}
      {step.problem ? (
        <Text variant="small" tone="danger">
          {step.problem}
        </Text>
      ) : null}
      {extras}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  list: { gap: space.sm },
  row: { borderWidth: 1, borderRadius: radius.md, padding: space.md, gap: space.sm },
  dashed: { borderStyle: 'dashed' },
  head: { flexDirection: 'row', gap: space.sm, alignItems: 'flex-start' },
  number: { minWidth: 22, paddingTop: 4 },
  title: { flex: 1 },
  facts: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm, paddingLeft: 30 },
  reading: { fontSize: 20, lineHeight: 26 },
  struck: { textDecorationLine: 'line-through' },
  tall: { minHeight: layout.primaryTouch },
});
