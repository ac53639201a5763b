import { Formik, useFormikContext, validateYupSchema, yupToFormErrors } from 'formik';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { JobView, MachineView } from '@shared/api/workshop-types';
import { jobSchema, machineSchema, MILEAGE_UNITS } from '@shared/workshop/schemas';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { FormError } from '@/components/ui/form-error';
import { Heading, Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { useCreateJob } from '@/hooks/use-jobs';
import { useCreateMachine, useMachines } from '@/hooks/use-machines';
import { showServerError } from '@/lib/form-errors';
import { useRequestKey } from '@/lib/idempotency-key';
import { layout, radius, space, useTheme } from '@/lib/theme';
import { machineName } from './machine-name';
import { VinCheck } from './vin-check';

type MachineMode = 'new' | 'existing';

interface Values {
  machineMode: MachineMode;
  machineId: string;
  make: string;
  model: string;
  year: string;
  engine: string;
  vin: string;
  mileage: string;
  mileageUnit: (typeof MILEAGE_UNITS)[number];
  customerName: string;
  customerContact: string;
  customerEmail: string;
  complaint: string;
  reference: string;
}

const initialValues: Values = {
  machineMode: 'new',
  machineId: '',
  make: '',
  model: '',
  year: '',
  engine: '',
  vin: '',
  mileage: '',
  mileageUnit: 'km',
  customerName: '',
  customerContact: '',
  customerEmail: '',
  complaint: '',
  reference: '',
};

const jobFields = jobSchema.omit(['machineId']);
const newMachineAndJob = machineSchema.concat(jobFields);

/** Empty optional numbers mean "not given", which the shared schemas spell null. */
const forSchema = (v: Values) => ({ ...v, mileage: v.mileage.trim() === '' ? null : v.mileage });

/** A new job: the customer, the complaint in their words, and the machine (already in the shop, or new). */
export function NewJobForm({ onCreated, onCancel }: { onCreated: (job: JobView) => void; onCancel: () => void }) {
  const createMachine = useCreateMachine();
  const createJob = useCreateJob();
  const machineKey = useRequestKey();
  const jobKey = useRequestKey();

  return (
    <Formik<Values>
      initialValues={initialValues}
      validate={async (values) => {
        try {
          await validateYupSchema(forSchema(values), values.machineMode === 'new' ? newMachineAndJob : jobSchema);
          return {};
        } catch (error) {
          return yupToFormErrors(error);
        }
      }}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(null);
        try {
          let machineId = values.machineId;
          if (values.machineMode === 'new') {
            const input = machineSchema.cast(forSchema(values), { stripUnknown: true });
            machineId = (await createMachine.trigger({ input, key: machineKey(input) })).machine.id;
            // The machine exists now: a second try adds only the job.
            await helpers.setValues({ ...values, machineMode: 'existing', machineId }, false);
          }
          const input = jobSchema.cast({ ...forSchema(values), machineId }, { stripUnknown: true });
          onCreated((await createJob.trigger({ input, key: jobKey(input) })).job);
        } catch (error) {
          showServerError(error, helpers);
        }
      }}
    >
      {({ status, isSubmitting, submitForm, values }) => (
        <View style={styles.form} testID="new-job-form">
          <FormError message={status} />
          <Card>
            <Heading level={2}>Customer and complaint</Heading>
            <TextField name="customerName" label="Customer name" testID="job-customer-name" autoComplete="off" />
            <TextField name="customerContact" label="Phone or other contact" hint="Optional" testID="job-customer-contact" inputMode="tel" />
            <TextField name="customerEmail" label="E-mail" hint="Optional; the report can be sent here." testID="job-customer-email" inputMode="email" autoComplete="off" />
            <TextField name="complaint" label="Complaint, in the customer's words" testID="job-complaint" />
            <TextField name="reference" label="Work order" hint="Optional, e.g. WO-2360" testID="job-reference" />
          </Card>
          <Card>
            <Heading level={2}>Machine</Heading>
            <MachineModePicker />
            {values.machineMode === 'new' ? <NewMachineFields /> : <ExistingMachinePicker />}
          </Card>
          <View style={styles.actions}>
            <Button testID="new-job-cancel" label="Back to jobs" icon="back" onPress={onCancel} style={styles.segment} />
            <Button testID="new-job-submit" variant="primary" label="Open the job" loading={isSubmitting} onPress={() => void submitForm()} style={styles.grow} />
          </View>
        </View>
      )}
    </Formik>
  );
}

function MachineModePicker() {
  const { values, setFieldValue } = useFormikContext<Values>();
  const choose = (mode: MachineMode) => void setFieldValue('machineMode', mode, false);
  return (
    <View style={styles.segments} role="group" aria-label="Machine">
      <Button testID="machine-mode-new" label="New machine" selected={values.machineMode === 'new'} onPress={() => choose('new')} style={[styles.grow, styles.segment]} />
      <Button testID="machine-mode-existing" label="Already in the shop" selected={values.machineMode === 'existing'} onPress={() => choose('existing')} style={[styles.grow, styles.segment]} />
    </View>
  );
}

function NewMachineFields() {
  const { values, setFieldValue } = useFormikContext<Values>();
  return (
    <View style={styles.fields}>
      <TextField name="make" label="Make" testID="machine-make" />
      <TextField name="model" label="Model" testID="machine-model" />
      <TextField name="year" label="Year" testID="machine-year" inputMode="numeric" />
      <TextField name="engine" label="Engine" hint="Optional, e.g. 649 cc parallel twin, CDI" testID="machine-engine" />
      <TextField name="vin" label="VIN" hint="Optional; 17 characters from the frame or plate." testID="machine-vin" />
      <VinCheck name="vin" />
      <TextField name="mileage" label="Mileage" hint="Optional" testID="machine-mileage" inputMode="numeric" />
      <View style={styles.segments} role="group" aria-label="Mileage unit">
        {MILEAGE_UNITS.map((unit) => (
          <Button key={unit} testID={`machine-mileage-${unit}`} label={unit} selected={values.mileageUnit === unit} onPress={() => void setFieldValue('mileageUnit', unit, false)} style={styles.segment} />
        ))}
      </View>
    </View>
  );
}

function ExistingMachinePicker() {
  const colors = useTheme();
  const machines = useMachines();
  const { values, setFieldValue, errors, submitCount } = useFormikContext<Values>();
  const [showAll, setShowAll] = useState(false);
  if (machines.error) return <FormError message={machines.error.message} />;
  if (!machines.data) return <Text tone="textMuted">Loading machines…</Text>;
  const list: MachineView[] = showAll ? machines.data.machines : machines.data.machines.slice(0, 8);
  return (
    <View style={styles.fields}>
      <View role="group" aria-label="Machines in the shop" style={[styles.list, { borderColor: colors.border }]}>
        {list.map((m) => (
          <Button
            key={m.id}
            testID={`machine-${m.id}`}
            variant="row"
            label={machineName(m)}
            description={[m.engine, m.vin].filter(Boolean).join(' · ') || undefined}
            selected={values.machineId === m.id}
            onPress={() => void setFieldValue('machineId', m.id)}
          />
        ))}
      </View>
      {machines.data.machines.length > list.length ? <Button testID="machines-show-all" variant="quiet" label="Show every machine" onPress={() => setShowAll(true)} /> : null}
      {submitCount > 0 && errors.machineId ? (
        <Text variant="small" tone="danger">
          {errors.machineId}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  fields: { gap: space.md },
  segments: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
  segment: { minHeight: layout.primaryTouch, minWidth: 64 },
  list: { borderWidth: 1, borderRadius: radius.md, overflow: 'hidden' },
  actions: { flexDirection: 'row', gap: space.md, flexWrap: 'wrap' },
  grow: { flexGrow: 1 },
});
