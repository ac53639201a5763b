import { useFormikContext } from 'formik';
import { useRef, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { MAX_PICTURES, movePicture, type CheckFormValues } from '@shared/editor/check-form';
import type { ProcedurePictureView } from '@shared/api/procedure-types';
import { PICTURE_MAX_BYTES, PICTURE_MAX_MB, procedurePicturePath } from '@shared/procedures/pictures';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { PhotoImage } from '@/features/photos/photo-image';
import { PhotoPicker } from '@/features/photos/photo-picker';
import type { PhotoFile } from '@/features/photos/photo-file';
import { useUpload } from '@/features/photos/use-upload';
import { radius, space, useTheme } from '@/lib/theme';

const RULES = {
  field: 'picture',
  maxBytes: PICTURE_MAX_BYTES,
  tooLarge: `The picture is larger than ${PICTURE_MAX_MB} MB. Save it at a lower resolution or pick a smaller file.`,
  failed: 'The picture could not be sent. Check the connection and pick it again; the rest of the check is kept.',
};

/**
 * The check's pictures: upload one, say what it shows, order them, remove one. A picture joins the check
 * (and so the draft, undo and autosave) once it has its description; a failed upload changes nothing else.
 */
export function PictureFields({ procedureId, checkTitle }: { procedureId: string; checkTitle: string }) {
  const colors = useTheme();
  const { values, setFieldValue } = useFormikContext<CheckFormValues>();
  const latest = useRef(values.pictures);
  latest.current = values.pictures;
  const [added, setAdded] = useState<string | null>(null);
  const { upload, uploading, error } = useUpload<{ picture: ProcedurePictureView }>(`/api/procedures/${procedureId}/pictures`, RULES);
  const pictures = values.pictures;

  const pick = async (file: PhotoFile) => {
    const answer = await upload(file);
    if (!answer) return;
    // Read the pictures as they are now: descriptions may have been typed while the file was on its way.
    void setFieldValue('pictures', [...latest.current, { src: answer.picture.id, alt: '' }]);
    setAdded(answer.picture.id);
  };

  return (
    <View style={styles.group} testID="form-pictures" role="group" aria-label="Pictures">
      <Text variant="bodyStrong">Pictures</Text>
      <Text variant="small" tone="textMuted">
        {`Diagrams or photos the technician sees on this check: JPEG, PNG or WebP up to ${PICTURE_MAX_MB} MB.`}
      </Text>
      {pictures.map((p, i) => {
        const name = p.alt.trim() ? `picture ${i + 1}, ${p.alt.trim()}` : `picture ${i + 1}`;
        return (
          <View key={`${i}:${p.src}`} style={[styles.picture, { borderColor: colors.border }]} testID={`form-picture-${i}`}>
            <PhotoImage path={procedurePicturePath(p.src)} alt={p.alt.trim() || `Picture ${i + 1} of ${checkTitle}`} width={120} height={90} testID={`form-picture-${i}-image`} />
            <View style={styles.grow}>
              <TextField
                name={`pictures.${i}.alt`}
                label="What the picture shows"
                hint={p.alt.trim() ? undefined : 'Required: the picture joins the check once it is described.'}
                autoFocus={added === p.src}
                testID={`form-picture-${i}-alt`}
              />
              <View style={styles.actions}>
                <Button testID={`form-picture-${i}-up`} label="Up" ariaLabel={`Move ${name} up`} disabled={i === 0} onPress={() => void setFieldValue('pictures', movePicture(pictures, i, -1))} />
                <Button testID={`form-picture-${i}-down`} label="Down" ariaLabel={`Move ${name} down`} disabled={i === pictures.length - 1} onPress={() => void setFieldValue('pictures', movePicture(pictures, i, 1))} />
                <Button testID={`form-picture-${i}-remove`} label="Remove" ariaLabel={`Remove ${name}`} onPress={() => void setFieldValue('pictures', pictures.filter((_, k) => k !== i))} />
              </View>
            </View>
          </View>
        );
      })}
      {uploading ? (
        <Text variant="small" tone="textMuted" role="status" testID="form-picture-uploading">
          Uploading the picture…
        </Text>
      ) : null}
      <FormError testID="form-picture-error" message={error?.message} />
      <PhotoPicker testID="form-picture-add" label={pictures.length ? 'Add another picture' : 'Add a picture'} busy={uploading} disabled={pictures.length >= MAX_PICTURES} onPick={pick} />
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.md },
  picture: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, borderWidth: 1, borderRadius: radius.md, padding: space.sm },
  grow: { flex: 1, minWidth: 200, gap: space.sm },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
