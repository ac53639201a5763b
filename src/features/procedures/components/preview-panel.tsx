import { useEffect, useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { checkUncertainty, windowOnly } from '@shared/diagnosis/spec-bar-geometry';
import { VERDICT_WORDS } from '@shared/diagnosis/verdict-words';
import { PREVIEW_AMBIENT_C, PREVIEW_METER, previewStep, type PreviewStep } from '@shared/editor/preview';
import type { PriorReading } from '@shared/engine/evaluate';
import { explainEvaluation } from '@shared/engine/explain';
import type { Check, MeasureCheck, ProcedureDocument } from '@shared/engine/procedure';
import { QUANTITY_INFO } from '@shared/engine/quantity';
import { specInWords } from '@shared/report/spec-words';
import { ReadingField } from '@/components/reading/reading-field';
import { SpecBar } from '@/components/spec-bar/spec-bar';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { Heading, Text } from '@/components/ui/text';
import { VerdictChip, VerdictPanel } from '@/components/verdict/verdict-mark';
import { CheckPictures } from '@/features/procedures/components/check-pictures';
import { radius, space, useTheme } from '@/lib/theme';

/**
 * Walks the draft as a technician would: one check at a time, readings typed as the meter shows them and
 * judged with the engine's `decideStep`. Nothing is recorded; the walk lives only in this panel.
 */
export function PreviewPanel({ document, onShowCheck }: { document: ProcedureDocument; onShowCheck: (id: string) => void }) {
  const [steps, setSteps] = useState<PreviewStep[]>([]);
  const currentId = steps.length ? steps[steps.length - 1].decision.nextCheckId : document.startCheckId;
  const current = document.checks.find((c) => c.id === currentId);
  const titleOf = (id: string) => document.checks.find((c) => c.id === id)?.title ?? `“${id}” (not in the draft)`;
  // Opening the preview shows where the walk stands on the diagram.
  // eslint-disable-next-line react-hooks/exhaustive-deps
  useEffect(() => {
    onShowCheck(currentId);
  }, []);

  const go = (step: PreviewStep) => {
    setSteps((s) => [...s, step]);
    onShowCheck(step.decision.nextCheckId);
  };
  const restart = () => {
    setSteps([]);
    onShowCheck(document.startCheckId);
  };
  const back = () => {
    const earlier = steps.slice(0, -1);
    setSteps(earlier);
    onShowCheck(earlier.length ? earlier[earlier.length - 1].decision.nextCheckId : document.startCheckId);
  };

  return (
    <View style={styles.panel} testID="preview-panel">
      <View style={styles.head}>
        <Heading level={2}>Preview</Heading>
        <View style={styles.actions}>
          <Button testID="preview-back" label="Back one check" disabled={!steps.length} onPress={back} />
          <Button testID="preview-restart" label="Restart" disabled={!steps.length} onPress={restart} />
        </View>
      </View>
      <Text variant="small" tone="textMuted">
        {`As a technician sees the draft, judged with a typical 6000-count meter at ${PREVIEW_AMBIENT_C} °C. Nothing is recorded.`}
      </Text>

      {steps.length ? (
        <View style={styles.path} testID="preview-path">
          <Text variant="label" tone="textMuted">
            {`WALKED · ${steps.length}`}
          </Text>
          {steps.map((s, i) => (
            <View key={i} style={styles.pathRow}>
              <Text style={styles.grow}>{`${i + 1}. ${titleOf(s.checkId)}`}</Text>
              {s.typed ? <Text variant="mono">{s.typed}</Text> : null}
              {s.decision.verdict ? <VerdictChip verdict={s.decision.verdict} /> : s.decision.choiceId ? <Text variant="small" tone="textMuted">{choiceLabel(document, s.checkId, s.decision.choiceId)}</Text> : null}
            </View>
          ))}
        </View>
      ) : null}

      {current ? (
        <CurrentCheck key={`${steps.length}:${current.id}`} document={document} check={current} steps={steps} number={steps.length + 1} titleOf={titleOf} onGo={go} />
      ) : (
        <FormError testID="preview-missing" message={`The walk led to “${currentId}”, which is not in the draft. Fix the outcome that points there, then restart.`} />
      )}
    </View>
  );
}

function choiceLabel(document: ProcedureDocument, checkId: string, choiceId: string): string {
  const check = document.checks.find((c) => c.id === checkId);
  return check?.kind === 'observe' ? (check.choices.find((c) => c.id === choiceId)?.label ?? choiceId) : choiceId;
}

interface CurrentProps {
  document: ProcedureDocument;
  check: Check;
  steps: PreviewStep[];
  number: number;
  titleOf: (id: string) => string;
  onGo: (step: PreviewStep) => void;
}

function CurrentCheck({ document, check, steps, number, titleOf, onGo }: CurrentProps) {
  const colors = useTheme();
  const [error, setError] = useState<string | null>(null);
  const decide = (input: { reading?: string; choiceId?: string }) => {
    const decision = previewStep(document, steps, check.id, input);
    if (!decision.ok) return setError(decision.message);
    onGo({ checkId: check.id, typed: input.reading?.trim() ?? '', decision });
  };
  return (
    <View style={[styles.card, { borderColor: colors.borderStrong, backgroundColor: colors.surface }]} testID="preview-check">
      <Text variant="label" tone="textMuted">
        {`CHECK ${number} · ${check.kind.toUpperCase()}`}
      </Text>
      <Text variant="title" testID="preview-check-title">
        {check.title}
      </Text>
      {check.instruction ? <Text>{check.instruction}</Text> : null}
      {check.probe ? (
        <Text variant="small">
          {[check.probe.connector && `Connector ${check.probe.connector}`, check.probe.pins?.length && `pins ${check.probe.pins.join(', ')}`, check.probe.wireColours?.length && `wires ${check.probe.wireColours.join(', ')}`]
            .filter(Boolean)
            .join(' · ')}
        </Text>
      ) : null}
      <CheckPictures check={check} size={{ width: 128, height: 96 }} testID="preview-pictures" />
      {[...(number === 1 ? document.cautions : []), ...(check.cautions ?? [])].map((c, i) => (
        <View key={i} style={[styles.caution, { backgroundColor: colors.warningSoft, borderLeftColor: colors.warning }]}>
          <Text>{c}</Text>
        </View>
      ))}
      {check.kind === 'measure' ? (
        <MeasureInput document={document} check={check} steps={steps} titleOf={titleOf} onRecord={(reading) => decide({ reading })} />
      ) : check.kind === 'observe' ? (
        <View style={styles.choices} role="group" aria-label="What did you observe?">
          {check.choices.map((c) => (
            <Button key={c.id} testID={`preview-choice-${c.id}`} label={c.label} style={styles.choice} onPress={() => decide({ choiceId: c.id })} />
          ))}
        </View>
      ) : check.kind === 'task' ? (
        <Button testID="preview-done" variant="primary" icon="check" label="Done, go on" onPress={() => decide({})} />
      ) : (
        <View style={styles.finding} testID="preview-finding">
          <Text variant="bodyStrong">{`Faulty: ${check.finding.part}`}</Text>
          <Text>{check.finding.action}</Text>
          <Text variant="small" tone="textMuted">
            The diagnosis would conclude here.
          </Text>
        </View>
      )}
      <FormError testID="preview-error" message={error} />
    </View>
  );
}

function MeasureInput({ document, check, steps, titleOf, onRecord }: { document: ProcedureDocument; check: MeasureCheck; steps: PreviewStep[]; titleOf: (id: string) => string; onRecord: (reading: string) => void }) {
  const colors = useTheme();
  const [text, setText] = useState('');
  const readings = useMemo(() => {
    const r: Record<string, PriorReading> = {};
    for (const s of steps) r[s.checkId] = { value: s.decision.value, overRange: s.decision.overRange, uncertainty: s.decision.evaluation?.uncertainty };
    return r;
  }, [steps]);
  const decision = text.trim() ? previewStep(document, steps, check.id, { reading: text }) : null;
  const judged = decision?.ok ? decision : null;
  const evaluation = judged?.evaluation ?? windowOnly(check.spec, check.quantity, { ambientC: PREVIEW_AMBIENT_C, readings });
  const uncertaintyAt = useMemo(() => checkUncertainty(check, PREVIEW_METER, readings), [check, readings]);
  const next = judged ? (judged.nextCheckId === check.id ? 'the same check again' : titleOf(judged.nextCheckId)) : null;
  return (
    <View style={styles.measure}>
      <Text variant="bodyStrong">
        Spec: <Text testID="preview-spec-words">{specInWords(check.spec, check.quantity, evaluation)}</Text>
      </Text>
      <SpecBar spec={check.spec} quantity={check.quantity} evaluation={evaluation} uncertaintyAt={uncertaintyAt} testID="preview-spec-bar" />
      <ReadingField testID="preview-reading" value={text} onChange={setText} onSubmit={() => judged && onRecord(text)} placeholder={QUANTITY_INFO[check.quantity].example.split(/,| or /)[0]} />
      {judged?.verdict && judged.evaluation ? (
        <VerdictPanel testID="preview-verdict" verdict={judged.verdict} explanation={explainEvaluation(check.spec, judged.evaluation, check.quantity)} next={next ? `Next: ${next}` : undefined} />
      ) : null}
      {decision && !decision.ok ? <FormError testID="preview-reading-error" message={decision.message} /> : null}
      <Button
        testID="preview-record"
        variant="primary"
        icon="forward"
        label={judged?.verdict ? `Go on: ${VERDICT_WORDS[judged.verdict].toLowerCase()}` : 'Go on'}
        disabled={!judged}
        onPress={() => onRecord(text)}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { gap: space.md },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: space.sm },
  actions: { flexDirection: 'row', gap: space.xs },
  path: { gap: space.xs },
  pathRow: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  grow: { flexGrow: 1, flexShrink: 1, minWidth: 120 },
  card: { borderWidth: 1, borderRadius: radius.lg, padding: space.md, gap: space.md },
  caution: { borderLeftWidth: 5, borderRadius: radius.sm, padding: space.sm },
  choices: { gap: space.sm },
  choice: { minHeight: 56, justifyContent: 'flex-start' },
  finding: { gap: space.xs },
  measure: { gap: space.sm },
});
