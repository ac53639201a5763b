import * as yup from 'yup';

/** What a photo upload accepts; the phone checks the same limits before sending. */
export const PHOTO_MAX_BYTES = 10 * 1024 * 1024;
export const PHOTO_MAX_MB = PHOTO_MAX_BYTES / (1024 * 1024);
export const PHOTO_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;
export type PhotoType = (typeof PHOTO_TYPES)[number];
/** A diagnosis holds at most this many photos, so one job cannot fill the data folder. */
export const PHOTOS_PER_DIAGNOSIS = 60;

/** The text fields of the multipart upload beside the `photo` file. */
export const photoFieldsSchema = yup
  .object({
    /** The step the photo belongs to; absent for a photo of the diagnosis as a whole. */
    stepId: yup.string().trim().uuid('stepId is the id of a step of this diagnosis.'),
  })
  .exact('Send only the picture in “photo” and, for a step, its id in “stepId”.');
export type PhotoFields = yup.InferType<typeof photoFieldsSchema>;
