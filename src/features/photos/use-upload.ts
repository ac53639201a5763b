import { useCallback, useRef, useState } from 'react';
import { ApiError, apiRaw } from '@/lib/api';
import { newIdempotencyKey } from '@/lib/idempotency-key';
import type { PhotoFile } from './photo-file';

export interface UploadRules {
  /** The multipart field the server reads the file from. */
  field: string;
  maxBytes: number;
  /** Said when the file is over `maxBytes`, before anything is sent. */
  tooLarge: string;
  /** Said when the upload did not reach the server. */
  failed: string;
}

export interface Upload<T> {
  /** Sends one picked file (with text fields sent before it); resolves to the server's answer, or null when it failed (see `error`). */
  upload: (file: PhotoFile, fields?: Record<string, string>) => Promise<T | null>;
  uploading: boolean;
  error: ApiError | null;
}

/**
 * Uploads picked pictures as multipart/form-data to `url`. Each picked file keeps its Idempotency-Key, so
 * sending it again after a lost answer stores it once.
 */
export function useUpload<T>(url: string, rules: UploadRules): Upload<T> {
  const [pending, setPending] = useState(0);
  const [error, setError] = useState<ApiError | null>(null);
  const keys = useRef(new WeakMap<object, string>());
  const { field, maxBytes, tooLarge, failed } = rules;

  const upload = useCallback(
    async (file: PhotoFile, fields: Record<string, string> = {}) => {
      setError(null);
      if (file.size !== undefined && file.size > maxBytes) {
        setError(new ApiError(413, `${field}_too_large`, tooLarge));
        return null;
      }
      let key = keys.current.get(file);
      if (!key) keys.current.set(file, (key = newIdempotencyKey()));
      const form = new FormData();
      for (const [name, value] of Object.entries(fields)) form.append(name, value);
      form.append(field, file as Blob);
      setPending((n) => n + 1);
      try {
        const response = await apiRaw(url, { method: 'POST', body: form }, { idempotencyKey: key });
        return (await response.json()) as T;
      } catch (err) {
        setError(err instanceof ApiError ? err : new ApiError(0, 'upload_failed', failed));
        return null;
      } finally {
        setPending((n) => n - 1);
      }
    },
    [url, field, maxBytes, tooLarge, failed],
  );

  return { upload, uploading: pending > 0, error };
}
