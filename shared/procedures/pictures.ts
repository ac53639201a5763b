import type { ProcedureDocument } from '../engine/procedure';

/**
 * Pictures on procedure checks (diagrams, photos of a connector). A check's `pictures[].src` is the id of
 * a picture uploaded to the shop (`POST /api/procedures/:id/pictures`); the bytes are served at
 * `procedurePicturePath(id)` to every member of that shop.
 */

/** What a picture upload accepts; the editor checks the same limit before sending. */
export const PICTURE_MAX_BYTES = 5 * 1024 * 1024;
export const PICTURE_MAX_MB = PICTURE_MAX_BYTES / (1024 * 1024);

/** The shape of a picture id: the uuid the server gave it. */
export const PICTURE_ID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;

export const procedurePicturePath = (id: string) => `/api/procedure-pictures/${encodeURIComponent(id)}`;

/** Every picture id the document refers to, once each. */
export function pictureIdsOf(document: ProcedureDocument): string[] {
  return [...new Set(document.checks.flatMap((c) => (c.pictures ?? []).map((p) => p.src)))];
}

export interface PictureProblem {
  /** Where in the document, as a yup path: `checks[2].pictures[0].src`. */
  field: string;
  message: string;
}

/** One problem for each picture of the document that is not among `stored` (the shop's picture ids). */
export function unknownPictures(document: ProcedureDocument, stored: ReadonlySet<string>): PictureProblem[] {
  return document.checks.flatMap((check, i) =>
    (check.pictures ?? []).flatMap((p, j) =>
      stored.has(p.src)
        ? []
        : [
            {
              field: `checks[${i}].pictures[${j}].src`,
              message: `Check “${check.id}”: picture ${j + 1} (“${p.alt}”) is not stored in this shop. Remove it from the check and upload the picture again.`,
            },
          ],
    ),
  );
}
