import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { decideStep } from '@shared/diagnosis/decide-step';
import { pathSoFar } from '@shared/diagnosis/path-so-far';
import { checkUncertainty, windowOnly } from '@shared/diagnosis/spec-bar-geometry';
import type { PriorReading } from '@shared/engine/evaluate';
import { explainEvaluation } from '@shared/engine/explain';
import type { MeasureCheck } from '@shared/engine/procedure';
import { referencedCheckId } from '@shared/engine/spec';
import { specInWords } from '@shared/report/spec-words';
import { ReadingField } from '@/components/reading/reading-field';
import { SpecBar } from '@/components/spec-bar/spec-bar';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { Text } from '@/components/ui/text';
import { VerdictChip, VerdictLine, VerdictPanel } from '@/components/verdict/verdict-mark';
import { radius, space, useTheme } from '@/lib/theme';
import { BackButton } from './back-button';
import { CheckDetails } from './check-details';
import { NoteField } from './note-field';
import { composeReading, namesItsUnit, OVER_RANGE, UNIT_CHIPS } from './reading-units';
import { StepFrame } from './step-frame';
import type { StepProps } from './step-props';

/**
 * A measure check: the spec as a bar and in words, the reading as the meter shows it, and the verdict the
 * moment it parses, worked out on the phone with the same `decideStep` the server runs.
 */
export function MeasureStep({ detail, local, check, number, onRecord, onBack, status, footer }: StepProps<MeasureCheck>) {
  const colors = useTheme();
  const [text, setText] = useState('');
  const [unit, setUnit] = useState(UNIT_CHIPS[check.quantity][0]);
  const [note, setNote] = useState('');

  const path = useMemo(() => pathSoFar(local.steps), [local.steps]);
  const readings = useMemo(() => {
    const r: Record<string, PriorReading> = {};
    for (const s of path) r[s.checkId] = { value: s.value, overRange: s.overRange, uncertainty: s.uncertainty };
    return r;
  }, [path]);
  const uncertaintyAt = useMemo(() => checkUncertainty(check, detail.meter.ranges, readings), [check, detail.meter.ranges, readings]);

  const reading = composeReading(text, unit);
  const decision = useMemo(
    () => (reading ? decideStep(detail.document, check.id, { reading }, { meterRanges: detail.meter.ranges, ambientC: detail.ambientC, path }) : null),
    [reading, detail, check.id, path],
  );
  const judged = decision?.ok ? decision : null;
  const evaluation = judged?.evaluation ?? windowOnly(check.spec, check.quantity, { ambientC: detail.ambientC, readings });

  const pairedId = referencedCheckId(check.spec);
  const paired = pairedId ? [...local.steps].reverse().find((s) => s.checkId === pairedId && !s.retracted) : undefined;
  const pairedTitle = pairedId ? detail.document.checks.find((c) => c.id === pairedId)?.title : undefined;

  const nextTitle = judged ? (judged.nextCheckId === check.id ? 'the same check again' : detail.document.checks.find((c) => c.id === judged.nextCheckId)?.title) : null;
  const ownUnit = namesItsUnit(text);
  const record = () => judged && onRecord({ checkId: check.id, reading, note: note.trim() });

  return (
    <StepFrame
      testID="measure-step"
      actions={
        <>
          {judged?.verdict ? <VerdictLine verdict={judged.verdict} detail={nextTitle ? `Next: ${nextTitle}` : undefined} /> : null}
          <View style={styles.actions}>
            <BackButton onBack={onBack} />
            <Button testID="record-reading" variant="primary" icon="check" label="Record reading" disabled={!judged} onPress={record} style={styles.grow} />
          </View>
        </>
      }
    >
      {status}
      <CheckDetails check={check} number={number} />

      <View style={styles.spec} testID="spec">
        <Text variant="bodyStrong">
          Spec: <Text testID="spec-words">{specInWords(check.spec, check.quantity, evaluation)}</Text>
        </Text>
        {evaluation.correctedToC !== null && evaluation.correctedToC !== 20 ? (
          <Text variant="small" tone="textMuted" testID="spec-corrected">
            A copper winding reads higher when warm: {specInWords(check.spec, check.quantity, null)} at 20 °C is corrected to the {detail.ambientC} °C you entered.
          </Text>
        ) : null}
        <SpecBar spec={check.spec} quantity={check.quantity} evaluation={evaluation} uncertaintyAt={uncertaintyAt} />
        <Text variant="small" tone="textMuted">
          Hatched bands: too close to the limit for {detail.meter.name} to call.
        </Text>
      </View>

      {pairedId ? (
        <View testID="paired-reading" style={[styles.paired, { borderColor: colors.border, backgroundColor: colors.surfaceSunken }]}>
          <Text variant="small" tone="textMuted">
            Earlier reading · {pairedTitle}
          </Text>
          {paired ? (
            <View style={styles.pairedRow}>
              <Text variant="mono" style={styles.pairedValue}>
                {paired.readingText ?? '—'}
              </Text>
              {paired.verdict ? <VerdictChip verdict={paired.verdict} /> : null}
            </View>
          ) : (
            <Text>Not on the path yet: this check compares with it.</Text>
          )}
        </View>
      ) : null}

      <View style={styles.entry}>
        <ReadingField testID="reading-input" value={text} onChange={setText} onSubmit={record} placeholder={check.quantity === 'temperature' ? '21' : '0.00'} />
        <View style={styles.chips} role="group" aria-label="Unit">
          {UNIT_CHIPS[check.quantity].map((u) => (
            <Button key={u} testID={`unit-${u}`} label={u} ariaLabel={`${u} (unit)`} selected={!ownUnit && unit === u} onPress={() => {
              setUnit(u);
              if (ownUnit) setText(text.replace(/[^\d.,+\-−]+$/, '').trim());
            }} style={styles.chip} />
          ))}
          {check.quantity !== 'temperature' ? (
            <Button testID="unit-OL" label={OVER_RANGE} ariaLabel="OL (over range)" selected={text.trim().toUpperCase() === OVER_RANGE} onPress={() => setText(OVER_RANGE)} style={styles.chip} />
          ) : null}
        </View>
      </View>

      {judged?.verdict && judged.evaluation ? (
        <VerdictPanel
          verdict={judged.verdict}
          explanation={explainEvaluation(check.spec, judged.evaluation, check.quantity)}
          next={nextTitle ? `Next: ${nextTitle}` : undefined}
        />
      ) : null}
      {decision && !decision.ok ? <FormError testID="reading-error" message={decision.message} /> : null}

      <NoteField value={note} onChange={setNote} />
      {footer}
    </StepFrame>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', gap: space.md },
  grow: { flexGrow: 1 },
  spec: { gap: space.sm },
  paired: { borderWidth: 1, borderRadius: radius.md, padding: space.md, gap: space.xs },
  pairedRow: { flexDirection: 'row', alignItems: 'center', gap: space.md, flexWrap: 'wrap' },
  pairedValue: { fontSize: 24, lineHeight: 30 },
  entry: { gap: space.sm },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  chip: { minWidth: 64, minHeight: 48 },
});
