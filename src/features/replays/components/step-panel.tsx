import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import type { PhotoView, StepView } from '@shared/api/diagnosis-types';
import type { PriorReading } from '@shared/engine/evaluate';
import { explainEvaluation } from '@shared/engine/explain';
import type { Check, MeasureCheck } from '@shared/engine/procedure';
import { formatValue } from '@shared/engine/units';
import { checkUncertainty } from '@shared/diagnosis/spec-bar-geometry';
import type { MeterRange } from '@shared/workshop/schemas';
import { Icon } from '@/components/ui/icon';
import { Heading, Text } from '@/components/ui/text';
import { SpecBar } from '@/components/spec-bar/spec-bar';
import { VerdictPanel } from '@/components/verdict/verdict-mark';
import { PhotoStrip } from '@/features/photos/photo-strip';
import { CheckPictures } from '@/features/procedures/components/check-pictures';
import { formatDuration } from '@/features/replays/replay-path';
import { formatDateTime } from '@/lib/format';
import { radius, space, type, useTheme } from '@/lib/theme';

const KIND_WORDS: Record<Check['kind'], string> = { measure: 'Measure', observe: 'Observe', task: 'Task', finding: 'Finding' };

interface StepPanelProps {
  step: StepView;
  check: Check;
  /** 1-based position and the number of steps, retracted ones included. */
  position: number;
  total: number;
  spentMs: number;
  /** The latest live reading of each earlier check, for specs that compare with one. */
  earlier: Record<string, PriorReading>;
  meterRanges: readonly MeterRange[];
  /** Where the step led, by title; null until revealed in practice. */
  nextTitle: string | null;
  /** False while a practice question hides the outcome: the verdict, the note and where it led. */
  revealed: boolean;
  /** The practice question, right under the reading so the reveal appears below it rather than pushing it away. */
  prompt?: ReactNode;
  /** Photos taken on this step, shown with the note once the step is revealed. */
  photos: readonly PhotoView[];
  /** The comments, at the end. */
  children?: ReactNode;
}

/** One step of a replay: the check's instructions and probe points, the reading against its spec, the verdict and the note. */
export function StepPanel({ step, check, position, total, spentMs, earlier, meterRanges, nextTitle, revealed, prompt, photos, children }: StepPanelProps) {
  const c = useTheme();
  return (
    <View style={styles.panel} testID={`replay-step-${step.seq}`}>
      <View style={styles.meta}>
        <Text variant="label" tone="textMuted" testID="replay-step-position">
          {`STEP ${position} OF ${total} · ${KIND_WORDS[check.kind].toUpperCase()}`}
        </Text>
        <Text variant="small" tone="textMuted">
          {`${formatDuration(spentMs)} on this step · ${step.by} · ${formatDateTime(step.recordedAt)}`}
        </Text>
      </View>
      {step.retracted ? <Retracted retractedAt={step.retractedAt} /> : null}
      <Heading level={2} testID="replay-step-title">
        {check.title}
      </Heading>
      <Text>{check.instruction}</Text>
      <Probe check={check} />
      <CheckPictures check={check} testID="replay-check-pictures" />
      {check.cautions?.length ? (
        <View style={[styles.cautions, { backgroundColor: c.warningSoft, borderLeftColor: c.warning }]}>
          {check.cautions.map((caution) => (
            <View key={caution} style={styles.cautionRow}>
              <Icon name="alert" size={20} color={c.warning} />
              <Text variant="small" style={styles.grow}>
                {caution}
              </Text>
            </View>
          ))}
        </View>
      ) : null}
      {check.kind === 'measure' ? <Reading step={step} check={check} earlier={earlier} meterRanges={meterRanges} revealed={revealed} /> : null}
      {check.kind === 'observe' ? (
        <Fact label="Observed" testID="replay-observed">
          <Text variant="title">{check.choices.find((ch) => ch.id === step.choiceId)?.label ?? step.choiceId}</Text>
        </Fact>
      ) : null}
      {check.kind === 'task' ? (
        <Fact label="Done">
          <Text variant="bodyStrong">Marked done by {step.by}.</Text>
        </Fact>
      ) : null}
      {prompt}
      {revealed && check.kind === 'measure' && step.evaluation && step.verdict ? (
        <VerdictPanel verdict={step.verdict} explanation={explainEvaluation(check.spec, step.evaluation, check.quantity)} testID="replay-verdict" />
      ) : null}
      {revealed && step.note ? (
        <View style={[styles.note, { borderLeftColor: c.primary, backgroundColor: c.surfaceSunken }]} testID="replay-note">
          <Text variant="label" tone="textMuted">
            {`NOTE FROM ${step.by.toUpperCase()}`}
          </Text>
          <Text>{step.note}</Text>
        </View>
      ) : null}
      {revealed && photos.length ? (
        <Fact label={photos.length === 1 ? 'Photo taken on this step' : `${photos.length} photos taken on this step`} testID="replay-photos">
          <PhotoStrip photos={photos} of={check.title} testID="replay-photo" />
        </Fact>
      ) : null}
      {revealed && nextTitle ? (
        <Fact label={step.retracted ? 'Would have led to' : 'Led to'} testID="replay-led-to">
          <Text variant="bodyStrong">{nextTitle}</Text>
        </Fact>
      ) : null}
      {children}
    </View>
  );
}

function Retracted({ retractedAt }: { retractedAt: string | null }) {
  const c = useTheme();
  return (
    <View testID="replay-retracted" style={[styles.retracted, { borderColor: c.danger, backgroundColor: c.dangerSoft }]}>
      <Icon name="back" color={c.danger} />
      <View style={styles.grow}>
        <Text variant="bodyStrong">Taken back: a detour</Text>
        <Text variant="small">
          {`The technician stepped back from this step${retractedAt ? ` at ${formatDateTime(retractedAt)}` : ''}. It is kept so you can see it; the path went on from the same check.`}
        </Text>
      </View>
    </View>
  );
}

function Probe({ check }: { check: Check }) {
  const p = check.probe;
  if (!p || (!p.connector && !p.pins?.length && !p.wireColours?.length)) return null;
  const rows: [string, string][] = [];
  if (p.connector) rows.push(['Connector', p.connector]);
  if (p.pins?.length) rows.push([p.pins.length > 1 ? 'Pins' : 'Pin', p.pins.join(' → ')]);
  if (p.wireColours?.length) rows.push(['Wires', p.wireColours.join(', ')]);
  return (
    <Fact label="Where to probe" testID="replay-probe">
      {rows.map(([label, value]) => (
        <Text key={label}>
          <Text variant="bodyStrong">{`${label}: `}</Text>
          {value}
        </Text>
      ))}
    </Fact>
  );
}

interface ReadingProps {
  step: StepView;
  check: MeasureCheck;
  earlier: Record<string, PriorReading>;
  meterRanges: readonly MeterRange[];
  revealed: boolean;
}

/** The reading as typed, in big numerals, against the spec bar; the marker once revealed. */
function Reading({ step, check, earlier, meterRanges, revealed }: ReadingProps) {
  const parsed = step.overRange ? 'OL: over range' : step.valueSi === null ? 'No reading' : asParsed(step.valueSi, check);
  const evaluation = step.evaluation;
  // Before the answer the bar shows the window alone, as the check screen does before a reading.
  const shown = evaluation && !revealed ? { ...evaluation, verdict: 'no_reading' as const, leans: null, compared: null, interval: null, uncertainty: 0 } : evaluation;
  return (
    <View style={styles.reading}>
      <Fact label="Reading as typed" testID="replay-reading">
        <Text style={type.reading}>{step.readingText ?? '—'}</Text>
        <Text variant="small" tone="textMuted">{`Read as ${parsed}`}</Text>
      </Fact>
      {shown ? <SpecBar spec={check.spec} quantity={check.quantity} evaluation={shown} uncertaintyAt={checkUncertainty(check, meterRanges, earlier)} testID="replay-spec-bar" /> : null}
    </View>
  );
}

/** The parsed value with the digits a meter shows (up to four), trailing zeros dropped: 12.64 V, 428 Ω, 4.1 Ω. */
function asParsed(value: number, check: MeasureCheck): string {
  return formatValue(value, check.quantity, { significant: 4 }).replace(/(\.\d*?)0+ /, '$1 ').replace('. ', ' ');
}

function Fact({ label, children, testID }: { label: string; children: ReactNode; testID?: string }) {
  return (
    <View style={styles.fact} testID={testID}>
      <Text variant="label" tone="textMuted">
        {label.toUpperCase()}
      </Text>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { gap: space.lg },
  meta: { gap: space.xs },
  grow: { flex: 1 },
  retracted: { flexDirection: 'row', gap: space.md, borderWidth: 2, borderStyle: 'dashed', borderRadius: radius.md, padding: space.md },
  cautions: { borderLeftWidth: 5, borderRadius: radius.md, padding: space.md, gap: space.sm },
  cautionRow: { flexDirection: 'row', gap: space.sm, alignItems: 'flex-start' },
  reading: { gap: space.md },
  note: { borderLeftWidth: 5, borderRadius: radius.md, padding: space.md, gap: space.xs },
  fact: { gap: space.xs },
});
