import { StyleSheet, View } from 'react-native';
import { FormError } from '@/components/ui/form-error';
import { Text } from '@/components/ui/text';
import { PhotoPicker } from '@/features/photos/photo-picker';
import { PhotoStrip } from '@/features/photos/photo-strip';
import { usePhotos } from '@/features/photos/use-photos';
import { space } from '@/lib/theme';

/** The photos of one recorded step, and the button to add more (camera or file). */
export function StepPhotos({ diagnosisId, stepId, seq, of, heading }: { diagnosisId: string; stepId: string; seq: number; of: string; heading?: string }) {
  const { photos, upload, uploading, error } = usePhotos(diagnosisId, stepId);
  return (
    <View style={styles.wrap} testID={`step-photos-${seq}`}>
      {heading ? <Text variant="bodyStrong">{heading}</Text> : null}
      <PhotoStrip photos={photos} of={of} size={{ width: 112, height: 84 }} testID={`photos-${seq}`} />
      <View style={styles.row}>
        <PhotoPicker onPick={upload} busy={uploading} label={photos.length ? `Add photo (${photos.length} so far)` : 'Add photo'} testID={`add-photo-${seq}`} />
      </View>
      {error ? <FormError message={error.message} testID={`photo-error-${seq}`} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
