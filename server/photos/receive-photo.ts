import type { Response } from 'express';
import { fileTypeFromBuffer } from 'file-type';
import multer from 'multer';
import { PHOTO_MAX_BYTES, PHOTO_MAX_MB, PHOTO_TYPES, type PhotoType } from '@shared/photos/schemas';
import { ApiError } from '../http/api-error';
import type { AuthedRequest } from '../http/route';

/** One file in the field `photo`, held in memory up to the size limit, plus at most a few short text fields. */
const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: PHOTO_MAX_BYTES, files: 1, fields: 4, fieldSize: 200, parts: 5 },
}).single('photo');

export interface ReceivedPhoto {
  bytes: Buffer;
  contentType: PhotoType;
}

/**
 * Reads the multipart upload (after sign-in and role checks, so strangers never
 * get a body buffered) and decides the type from the bytes themselves: the
 * file name and the type the client claims are ignored.
 */
export async function receivePhoto(req: AuthedRequest, res: Response): Promise<ReceivedPhoto> {
  await new Promise<void>((resolve, reject) => {
    upload(req, res, (err: unknown) => (err ? reject(uploadError(err)) : resolve()));
  });
  if (!req.file) {
    throw new ApiError(400, 'photo_missing', 'Attach the picture as multipart/form-data in the field “photo”.', { photo: 'Attach a picture.' });
  }
  const sniffed = await fileTypeFromBuffer(req.file.buffer);
  const contentType = PHOTO_TYPES.find((t) => t === sniffed?.mime);
  if (!contentType) {
    const what = sniffed ? `a ${sniffed.ext.toUpperCase()} file` : 'not a picture';
    throw new ApiError(415, 'unsupported_photo_type', `This file is ${what}, whatever its name says. Send a JPEG, PNG or WebP photo.`, {
      photo: 'Send a JPEG, PNG or WebP photo.',
    });
  }
  return { bytes: req.file.buffer, contentType };
}

function uploadError(err: unknown): ApiError {
  if (err instanceof multer.MulterError) {
    if (err.code === 'LIMIT_FILE_SIZE') {
      return new ApiError(413, 'photo_too_large', `The photo is larger than ${PHOTO_MAX_MB} MB. Take it at a lower resolution or pick a smaller file.`, {
        photo: `At most ${PHOTO_MAX_MB} MB.`,
      });
    }
    if (err.code === 'LIMIT_UNEXPECTED_FILE' || err.code === 'LIMIT_FILE_COUNT') {
      return new ApiError(400, 'photo_field', 'Send one picture, in the field “photo”.');
    }
    return new ApiError(400, 'upload_fields', 'Send only the picture in “photo” and, for a step, its id in “stepId”.');
  }
  return new ApiError(400, 'upload_unreadable', 'The upload was cut off or is not valid multipart/form-data. Try again.');
}
