import { Formik } from 'formik';
import { StyleSheet, View } from 'react-native';
import { createProcedureSchema, type CreateProcedureInput } from '@shared/procedures/schemas';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { Heading } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { useCreateProcedure } from '@/hooks/use-procedures';
import { showServerError } from '@/lib/form-errors';
import { space } from '@/lib/theme';

/** Title, complaint and family of a new procedure; the editor opens on its first draft. */
export function CreateProcedureForm({ onCreated, onCancel }: { onCreated: (id: string) => void; onCancel: () => void }) {
  const create = useCreateProcedure();
  return (
    <Formik<CreateProcedureInput>
      initialValues={{ title: '', complaint: '', family: '' }}
      validationSchema={createProcedureSchema}
      onSubmit={async (values, helpers) => {
        try {
          const { procedure } = await create.trigger(createProcedureSchema.cast(values));
          onCreated(procedure.id);
        } catch (error) {
          showServerError(error, helpers);
        }
      }}
    >
      {({ submitForm, isSubmitting, status }) => (
        <View style={styles.form} testID="create-procedure-form">
          <Heading level={2}>New procedure</Heading>
          <FormError message={status as string | undefined} />
          <TextField name="title" label="Title" hint="What the tech picks at the bench, e.g. “No spark, single-cylinder CDI”." testID="create-title" autoFocus />
          <TextField name="complaint" label="Complaint" hint="In the trade's words: “cranks but no spark”." testID="create-complaint" />
          <TextField name="family" label="Machine family" hint="Which machines it applies to." testID="create-family" />
          <View style={styles.actions}>
            <Button testID="create-submit" variant="primary" label="Create and open" loading={isSubmitting} onPress={() => void submitForm()} />
            <Button testID="create-cancel" variant="quiet" label="Cancel" onPress={onCancel} />
          </View>
        </View>
      )}
    </Formik>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg, maxWidth: 560 },
  actions: { flexDirection: 'row', gap: space.md, flexWrap: 'wrap' },
});
