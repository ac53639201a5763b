import { StyleSheet, View } from 'react-native';
import type { PhotoView } from '@shared/api/diagnosis-types';
import { FormError } from '@/components/ui/form-error';
import { Text } from '@/components/ui/text';
import { PhotoPicker } from '@/features/photos/photo-picker';
import { PhotoStrip } from '@/features/photos/photo-strip';
import { usePhotos } from '@/features/photos/use-photos';
import { space } from '@/lib/theme';
import { ReportSection } from './report-section';

/** Photos of the diagnosis as a whole; those who run diagnoses may add one, e.g. of the finished repair. */
export function ReportPhotos({ diagnosisId, photos, canAdd }: { diagnosisId: string; photos: PhotoView[]; canAdd: boolean }) {
  if (!photos.length && !canAdd) return null;
  return (
    <ReportSection title="Photos" testID="report-photos">
      <PhotoStrip photos={photos} of="the diagnosis" size={{ width: 216, height: 162 }} testID="report-photo" />
      {canAdd ? <AddPhoto diagnosisId={diagnosisId} empty={!photos.length} /> : null}
    </ReportSection>
  );
}

function AddPhoto({ diagnosisId, empty }: { diagnosisId: string; empty: boolean }) {
  const { upload, uploading, error } = usePhotos(diagnosisId);
  return (
    <View style={styles.add} testID="report-add-photo">
      {empty ? <Text tone="textMuted">No photos yet. A photo of the fault or of the finished repair helps the customer see what was done.</Text> : null}
      <PhotoPicker testID="report-photo-add" busy={uploading} onPick={upload} />
      <FormError message={error?.message} testID="report-photo-error" />
    </View>
  );
}

const styles = StyleSheet.create({
  add: { gap: space.sm, alignItems: 'flex-start' },
});
