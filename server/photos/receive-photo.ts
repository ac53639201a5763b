import type { Response } from 'express';
import { fileTypeFromBuffer } from 'file-type';
import multer from 'multer';
import { PHOTO_MAX_BYTES, PHOTO_TYPES, type PhotoType } from '@shared/photos/schemas';
import { ApiError } from '../http/api-error';
import type { AuthedRequest } from '../http/route';

export interface ReceivedPhoto {
  bytes: Buffer;
  contentType: PhotoType;
}

/** What one kind of upload takes: the file's field, its size limit, and how to name it in messages. */
export interface UploadRules {
  /** The multipart field that holds the file, also the key of its field errors. */
  field: string;
  maxBytes: number;
  /** "photo", "picture": how messages name the file. */
  noun: string;
  /** What to do with too large a file, after "The <noun> is larger than N MB." */
  tooLargeHint: string;
  /** How many short text fields may come beside the file, and what to send instead of others. */
  textFields: number;
  fieldsHint: string;
}

/**
 * Makes a reader of one multipart upload (run after sign-in and role checks, so strangers never get a body
 * buffered): one file in `rules.field`, held in memory up to the size limit, plus at most a few short text
 * fields. The type is decided from the bytes themselves: the file name and the type the client claims are
 * ignored.
 */
export function pictureReceiver(rules: UploadRules): (req: AuthedRequest, res: Response) => Promise<ReceivedPhoto> {
  const upload = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: rules.maxBytes, files: 1, fields: rules.textFields, fieldSize: 200, parts: rules.textFields + 1 },
  }).single(rules.field);
  const mb = rules.maxBytes / (1024 * 1024);

  const uploadError = (err: unknown): ApiError => {
    if (err instanceof multer.MulterError) {
      if (err.code === 'LIMIT_FILE_SIZE') {
        return new ApiError(413, `${rules.noun}_too_large`, `The ${rules.noun} is larger than ${mb} MB. ${rules.tooLargeHint}`, { [rules.field]: `At most ${mb} MB.` });
      }
      if (err.code === 'LIMIT_UNEXPECTED_FILE' || err.code === 'LIMIT_FILE_COUNT') {
        return new ApiError(400, `${rules.noun}_field`, `Send one picture, in the field “${rules.field}”.`);
      }
      return new ApiError(400, 'upload_fields', rules.fieldsHint);
    }
    return new ApiError(400, 'upload_unreadable', 'The upload was cut off or is not valid multipart/form-data. Try again.');
  };

  return async (req, res) => {
    await new Promise<void>((resolve, reject) => {
      upload(req, res, (err: unknown) => (err ? reject(uploadError(err)) : resolve()));
    });
    if (!req.file) {
      throw new ApiError(400, `${rules.noun}_missing`, `Attach the picture as multipart/form-data in the field “${rules.field}”.`, { [rules.field]: 'Attach a picture.' });
    }
    const sniffed = await fileTypeFromBuffer(req.file.buffer);
    const contentType = PHOTO_TYPES.find((t) => t === sniffed?.mime);
    if (!contentType) {
      const what = sniffed ? `a ${sniffed.ext.toUpperCase()} file` : 'not a picture';
      throw new ApiError(415, `unsupported_${rules.noun}_type`, `This file is ${what}, whatever its name says. Send a JPEG, PNG or WebP ${rules.noun}.`, {
        [rules.field]: `Send a JPEG, PNG or WebP ${rules.noun}.`,
      });
    }
    return { bytes: req.file.buffer, contentType };
  };
}

/** A diagnosis photo: the file in `photo`, and for a step its id in `stepId`. */
export const receivePhoto = pictureReceiver({
  field: 'photo',
  maxBytes: PHOTO_MAX_BYTES,
  noun: 'photo',
  tooLargeHint: 'Take it at a lower resolution or pick a smaller file.',
  textFields: 4,
  fieldsHint: 'Send only the picture in “photo” and, for a step, its id in “stepId”.',
});
