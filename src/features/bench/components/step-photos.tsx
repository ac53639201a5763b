import { StyleSheet, View } from 'react-native';
import { FormError } from '@/components/ui/form-error';
import { Text } from '@/components/ui/text';
import { PhotoPicker } from '@/features/photos/photo-picker';
import { PhotoStrip } from '@/features/photos/photo-strip';
import { usePhotos } from '@/features/photos/use-photos';
import { space } from '@/lib/theme';

interface StepPhotosProps {
  diagnosisId: string;
  /** The recorded step, or null for photos of the diagnosis as a whole (the finished repair). */
  stepId: string | null;
  /** Names the testIDs: the step's sequence number, or "repair". */
  name: string;
  /** What the photos show, for their accessible names. */
  of: string;
  heading?: string;
  /** Offer the button to add one (camera or file); without it, only existing photos show. */
  canAdd: boolean;
}

/** The photos of one recorded step (or of the whole diagnosis), and the way to add more. */
export function StepPhotos({ diagnosisId, stepId, name, of, heading, canAdd }: StepPhotosProps) {
  const { photos, upload, uploading, error } = usePhotos(diagnosisId, stepId);
  if (!canAdd && !photos.length) return null;
  return (
    <View style={styles.wrap} testID={`step-photos-${name}`}>
      {heading ? <Text variant="bodyStrong">{heading}</Text> : null}
      <PhotoStrip photos={photos} of={of} size={{ width: 112, height: 84 }} testID={`photos-${name}`} />
      {canAdd ? (
        <View style={styles.row}>
          <PhotoPicker onPick={upload} busy={uploading} label={photos.length ? `Add photo (${photos.length} so far)` : 'Add photo'} testID={`add-photo-${name}`} />
        </View>
      ) : null}
      {error ? <FormError message={error.message} testID={`photo-error-${name}`} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
