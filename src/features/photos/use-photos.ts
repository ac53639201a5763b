import { useCallback, useRef, useState } from 'react';
import { useSWRConfig } from 'swr';
import type { DiagnosisDetail, PhotoView } from '@shared/api/diagnosis-types';
import { PHOTO_MAX_BYTES, PHOTO_MAX_MB } from '@shared/photos/schemas';
import { diagnosisKey, useDiagnosis } from '@/hooks/use-diagnosis';
import { ApiError, apiRaw } from '@/lib/api';
import { newIdempotencyKey } from '@/lib/idempotency-key';
import type { PhotoFile } from './photo-file';

export interface UsePhotos {
  /** The photos of the step (or, without a step, of the whole diagnosis), oldest first. */
  photos: PhotoView[];
  /** Uploads one picked picture; resolves to the stored photo, or null when it failed (see `error`). */
  upload: (file: PhotoFile) => Promise<PhotoView | null>;
  uploading: boolean;
  error: ApiError | null;
}

/**
 * Photos of a diagnosis, or of one of its steps, and uploading more. Each picked
 * file keeps its Idempotency-Key, so uploading it again after a lost answer
 * stores it once. The diagnosis in the swr cache gains the photo at once.
 */
export function usePhotos(diagnosisId: string, stepId: string | null = null): UsePhotos {
  const { mutate } = useSWRConfig();
  const { data } = useDiagnosis(diagnosisId);
  const [pending, setPending] = useState(0);
  const [error, setError] = useState<ApiError | null>(null);
  const keys = useRef(new WeakMap<object, string>());

  const upload = useCallback(
    async (file: PhotoFile) => {
      setError(null);
      if (file.size !== undefined && file.size > PHOTO_MAX_BYTES) {
        setError(new ApiError(413, 'photo_too_large', `The photo is larger than ${PHOTO_MAX_MB} MB. Take it at a lower resolution or pick a smaller file.`));
        return null;
      }
      let key = keys.current.get(file);
      if (!key) keys.current.set(file, (key = newIdempotencyKey()));
      const form = new FormData();
      if (stepId) form.append('stepId', stepId);
      form.append('photo', file as Blob);
      setPending((n) => n + 1);
      try {
        const response = await apiRaw(`/api/diagnoses/${diagnosisId}/photos`, { method: 'POST', body: form }, { idempotencyKey: key });
        const { photo } = (await response.json()) as { photo: PhotoView };
        await mutate<{ diagnosis: DiagnosisDetail }>(
          diagnosisKey(diagnosisId),
          (current) => current && { diagnosis: { ...current.diagnosis, photos: [...current.diagnosis.photos.filter((p) => p.id !== photo.id), photo] } },
          { revalidate: false },
        );
        return photo;
      } catch (err) {
        setError(err instanceof ApiError ? err : new ApiError(0, 'upload_failed', 'The photo could not be sent. Try again.'));
        return null;
      } finally {
        setPending((n) => n - 1);
      }
    },
    [diagnosisId, stepId, mutate],
  );

  const photos = (data?.diagnosis.photos ?? []).filter((p) => p.stepId === stepId);
  return { photos, upload, uploading: pending > 0, error };
}
