import { useCallback } from 'react';
import { useSWRConfig } from 'swr';
import type { DiagnosisDetail, PhotoView } from '@shared/api/diagnosis-types';
import { PHOTO_MAX_BYTES, PHOTO_MAX_MB } from '@shared/photos/schemas';
import { diagnosisKey, useDiagnosis } from '@/hooks/use-diagnosis';
import type { ApiError } from '@/lib/api';
import type { PhotoFile } from './photo-file';
import { useUpload } from './use-upload';

export interface UsePhotos {
  /** The photos of the step (or, without a step, of the whole diagnosis), oldest first. */
  photos: PhotoView[];
  /** Uploads one picked picture; resolves to the stored photo, or null when it failed (see `error`). */
  upload: (file: PhotoFile) => Promise<PhotoView | null>;
  uploading: boolean;
  error: ApiError | null;
}

const RULES = {
  field: 'photo',
  maxBytes: PHOTO_MAX_BYTES,
  tooLarge: `The photo is larger than ${PHOTO_MAX_MB} MB. Take it at a lower resolution or pick a smaller file.`,
  failed: 'The photo could not be sent. Try again.',
};

/**
 * Photos of a diagnosis, or of one of its steps, and uploading more (once per picked file, whatever the
 * retries). The diagnosis in the swr cache gains the photo at once.
 */
export function usePhotos(diagnosisId: string, stepId: string | null = null): UsePhotos {
  const { mutate } = useSWRConfig();
  const { data } = useDiagnosis(diagnosisId);
  const sender = useUpload<{ photo: PhotoView }>(`/api/diagnoses/${diagnosisId}/photos`, RULES);
  const send = sender.upload;

  const upload = useCallback(
    async (file: PhotoFile) => {
      const answer = await send(file, stepId ? { stepId } : {});
      if (!answer) return null;
      const { photo } = answer;
      await mutate<{ diagnosis: DiagnosisDetail }>(
        diagnosisKey(diagnosisId),
        (current) => current && { diagnosis: { ...current.diagnosis, photos: [...current.diagnosis.photos.filter((p) => p.id !== photo.id), photo] } },
        { revalidate: false },
      );
      return photo;
    },
    [diagnosisId, stepId, mutate, send],
  );

  const photos = (data?.diagnosis.photos ?? []).filter((p) => p.stepId === stepId);
  return { photos, upload, uploading: sender.uploading, error: sender.error };
}
