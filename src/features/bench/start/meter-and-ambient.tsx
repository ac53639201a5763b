import { Formik } from 'formik';
import { StyleSheet, View } from 'react-native';
import { startDiagnosisSchema } from '@shared/diagnosis/schemas';
import { Button } from '@/components/ui/button';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { useMeters } from '@/hooks/use-meters';
import { radius, space, useTheme } from '@/lib/theme';
import { readLastStart } from './last-used';

const schema = startDiagnosisSchema.pick(['meterId', 'ambientC']);

/** Step 3: the meter in hand (its accuracy decides "marginal") and the bay's temperature (it corrects copper windows). */
export function MeterAndAmbient({ onDone }: { onDone: (meterId: string, ambientC: number) => void }) {
  const colors = useTheme();
  const meters = useMeters();
  if (meters.error) return <ErrorState title="Can't load the meters" error={meters.error} onRetry={() => void meters.mutate()} />;
  if (!meters.data) return <LoadingState label="Loading meters…" />;
  const last = readLastStart();
  const list = meters.data.meters;
  const meterId = list.some((m) => m.id === last?.meterId) ? last!.meterId : (list[0]?.id ?? '');

  return (
    <Formik
      initialValues={{ meterId, ambientC: last ? String(last.ambientC) : '' }}
      validationSchema={schema}
      onSubmit={(values) => {
        const cast = schema.cast(values);
        onDone(cast.meterId, cast.ambientC);
      }}
    >
      {({ values, setFieldValue, submitForm, errors, submitCount }) => (
        <View style={styles.wrap}>
          <Text nativeID="meter-label" variant="bodyStrong">
            The meter in your hand
          </Text>
          <View role="group" aria-labelledby="meter-label" style={[styles.list, { borderColor: colors.border }]}>
            {list.map((m) => (
              <Button key={m.id} testID={`meter-${m.id}`} variant="row" label={m.name} description={m.model} selected={values.meterId === m.id} onPress={() => void setFieldValue('meterId', m.id)} />
            ))}
          </View>
          {submitCount > 0 && errors.meterId ? (
            <Text variant="small" tone="danger">
              {errors.meterId}
            </Text>
          ) : null}
          <TextField
            name="ambientC"
            label="Ambient temperature, °C"
            hint={last ? `Last used on this device: ${last.ambientC} °C. Copper windows are corrected to it.` : 'Copper windows are corrected to it, e.g. 21.'}
            testID="start-ambient"
            inputMode="decimal"
          />
          <Button testID="start-meter-next" variant="primary" label="Continue" icon="forward" onPress={() => void submitForm()} />
        </View>
      )}
    </Formik>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  list: { borderWidth: 1, borderRadius: radius.md, overflow: 'hidden' },
});
