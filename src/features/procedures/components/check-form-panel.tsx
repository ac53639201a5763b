import { Formik, useFormikContext } from 'formik';
import { useEffect, useRef } from 'react';
import { StyleSheet, View } from 'react-native';
import { checkFormSchema, checkFromForm, DEFAULT_CHOICES, formValuesOf, MAX_CHOICES, newChoiceId, SPEC_FIELDS, SPEC_LABELS, type CheckFormValues } from '@shared/editor/check-form';
import { CHECK_KINDS, type Check, type ProcedureDocument } from '@shared/engine/procedure';
import { QUANTITIES, QUANTITY_INFO } from '@shared/engine/quantity';
import { SPEC_KINDS } from '@shared/engine/spec';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { Heading, Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { ChipRow } from '@/features/procedures/components/chip-row';
import { PictureFields } from '@/features/procedures/components/picture-fields';
import { space } from '@/lib/theme';

const words = (s: string) => s.replace(/_/g, ' ');

/** The selected check as a form; every valid change goes into the draft at once (and so into undo and autosave). */
export function CheckFormPanel({ procedureId, check, document, onChange }: { procedureId: string; check: Check; document: ProcedureDocument; onChange: (next: Check, group: string) => void }) {
  return (
    <Formik<CheckFormValues> initialValues={formValuesOf(check)} validationSchema={checkFormSchema} validateOnMount onSubmit={() => undefined}>
      <View style={styles.form} testID="check-form">
        <Heading level={2}>Check “{check.id}”</Heading>
        <Fields document={document} check={check} />
        <PictureFields procedureId={procedureId} checkTitle={check.title} />
        <Sync check={check} onChange={onChange} />
      </View>
    </Formik>
  );
}

function Sync({ check, onChange }: { check: Check; onChange: (next: Check, group: string) => void }) {
  const { values } = useFormikContext<CheckFormValues>();
  const first = useRef(true);
  useEffect(() => {
    if (first.current) {
      first.current = false;
      return;
    }
    if (!checkFormSchema.isValidSync(values)) return;
    const next = checkFromForm(values, check);
    if (JSON.stringify(next) !== JSON.stringify(check)) onChange(next, `form:${check.id}`);
    // Only the typed values drive this; the check itself is the base they apply to.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [values]);
  return null;
}

function Fields({ document, check }: { document: ProcedureDocument; check: Check }) {
  const { values, setFieldValue } = useFormikContext<CheckFormValues>();
  const set = (field: keyof CheckFormValues) => (v: unknown) => void setFieldValue(field, v);
  const unit = QUANTITY_INFO[values.quantity].symbol;
  const example = QUANTITY_INFO[values.quantity].example;
  const fields = SPEC_FIELDS[values.specKind];
  const others = document.checks.filter((c) => c.id !== check.id && c.kind === 'measure');
  return (
    <>
      <ChipRow label="Kind" testID="form-kind" value={values.kind} onChange={(k) => {
        void setFieldValue('kind', k);
        if (k === 'observe' && values.choices.length === 0) void setFieldValue('choices', [...DEFAULT_CHOICES]);
      }} options={CHECK_KINDS.map((k) => ({ value: k, label: k }))} />
      <TextField name="title" label="Title" testID="form-title" />
      <TextField name="instruction" label="Instruction" hint="What to do, in short sentences." testID="form-instruction" />
      {values.kind !== 'finding' ? (
        <View style={styles.group}>
          <Text variant="bodyStrong">Where to probe</Text>
          <TextField name="connector" label="Connector" testID="form-connector" />
          <TextField name="pins" label="Pins" hint="Separated by commas: 1, 2" testID="form-pins" />
          <TextField name="wireColours" label="Wire colours" hint="Separated by commas: BL/Y, G/W" testID="form-wires" />
        </View>
      ) : null}
      {values.kind === 'measure' ? (
        <View style={styles.group}>
          <ChipRow label="Measures" testID="form-quantity" value={values.quantity} onChange={(q) => {
            void setFieldValue('quantity', q);
            void setFieldValue('meterFunction', QUANTITY_INFO[q].meterFunctions[0]);
          }} options={QUANTITIES.map((q) => ({ value: q, label: QUANTITY_INFO[q].noun }))} />
          <ChipRow label="Meter function" testID="form-function" value={values.meterFunction} onChange={set('meterFunction')} options={[{ value: '' as const, label: 'Default' }, ...QUANTITY_INFO[values.quantity].meterFunctions.map((f) => ({ value: f, label: words(f) }))]} />
          <TextField name="range" label="Meter range" hint={`Full scale with its unit, e.g. 20 k${unit === 'Ω' ? 'Ω' : unit}; empty for autorange.`} testID="form-range" />
          <ChipRow label="Spec" testID="form-spec" value={values.specKind} onChange={set('specKind')} options={SPEC_KINDS.map((k) => ({ value: k, label: SPEC_LABELS[k] }))} />
          {fields.includes('min') ? <TextField name="min" label={`Minimum (${unit})`} hint={`With a prefix if you like: ${example}`} testID="form-min" /> : null}
          {fields.includes('max') ? <TextField name="max" label={values.specKind === 'expect_continuity' ? `Continuity below (${unit})` : `Maximum (${unit})`} testID="form-max" /> : null}
          {fields.includes('nominal') ? <TextField name="nominal" label={`Nominal (${unit})`} testID="form-nominal" /> : null}
          {fields.includes('openAbove') ? <TextField name="openAbove" label={`Counts as open above (${unit})`} hint="Empty: only over range (OL) is open." testID="form-open-above" /> : null}
          {fields.includes('tolerance') ? (
            <>
              <ChipRow label="Tolerance in" testID="form-tol-in" value={values.toleranceIn} onChange={set('toleranceIn')} options={[{ value: 'pct', label: '% of value' }, { value: 'abs', label: unit }]} />
              <TextField name="tolerance" label={values.toleranceIn === 'pct' ? 'Tolerance (%)' : `Tolerance (${unit})`} testID="form-tolerance" />
            </>
          ) : null}
          {fields.includes('minRatio') ? <TextField name="minRatio" label="Minimum ratio (reverse ÷ forward)" testID="form-ratio" /> : null}
          {fields.includes('refCheck') ? (
            <ChipRow label="Compared with the reading of" testID="form-ref" value={values.refCheck} onChange={set('refCheck')} options={others.map((c) => ({ value: c.id, label: c.title }))} />
          ) : null}
          {['window', 'nominal', 'at_most', 'at_least'].includes(values.specKind) ? (
            <Button testID="form-copper" label="Limits are for a copper winding at 20 °C" selected={values.copperAt20C} onPress={() => void setFieldValue('copperAt20C', !values.copperAt20C)} />
          ) : null}
          <ChipRow label="A marginal reading" testID="form-marginal" value={values.marginalPolicy} onChange={set('marginalPolicy')} options={[
            { value: '' as const, label: 'As the procedure says' },
            { value: 'fail' as const, label: 'Counts as the side it leans to' },
            { value: 'pass' as const, label: 'Counts as in spec' },
            { value: 'branch' as const, label: 'Has its own outcome' },
          ]} />
        </View>
      ) : null}
      {values.kind === 'observe' ? <ChoicesFields /> : null}
      {values.kind === 'finding' ? (
        <View style={styles.group}>
          <TextField name="part" label="Faulty part or cause" testID="form-part" />
          <TextField name="action" label="What to do" testID="form-action" />
        </View>
      ) : null}
      <TextField name="cautions" label="Cautions" hint="Separate cautions with “|”; they show on this check." testID="form-cautions" />
    </>
  );
}

/** The observations the technician picks from; where each one leads is set under Outcomes. */
function ChoicesFields() {
  const { values, errors, setFieldValue } = useFormikContext<CheckFormValues>();
  const choices = values.choices;
  const whole = typeof errors.choices === 'string' ? errors.choices : null;
  return (
    <View style={styles.group} testID="form-choices" role="group" aria-label="Choices">
      <Text variant="bodyStrong">Choices</Text>
      <Text variant="small" tone="textMuted">
        What the technician can observe, one button each. Where each leads is set under Outcomes.
      </Text>
      {choices.map((c, i) => (
        <View key={c.id} style={styles.choice}>
          <View style={styles.grow}>
            <TextField name={`choices.${i}.label`} label={`Choice ${i + 1}`} testID={`form-choice-${i}`} />
          </View>
          <Button
            testID={`form-choice-${i}-remove`}
            label="Remove"
            ariaLabel={`Remove choice ${i + 1}${c.label ? `, ${c.label}` : ''}`}
            disabled={choices.length <= 2}
            onPress={() => void setFieldValue('choices', choices.filter((_, k) => k !== i))}
          />
        </View>
      ))}
      <FormError testID="form-choices-error" message={whole} />
      <Button
        testID="form-choice-add"
        label="Add a choice"
        icon="plus"
        disabled={choices.length >= MAX_CHOICES}
        onPress={() => void setFieldValue('choices', [...choices, { id: newChoiceId(choices), label: '' }])}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  group: { gap: space.md },
  choice: { flexDirection: 'row', alignItems: 'flex-end', gap: space.sm },
  grow: { flex: 1 },
});
