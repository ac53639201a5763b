import { In, type EntityManager } from 'typeorm';
import type { ProcedureDocument } from '@shared/engine/procedure';
import { pictureIdsOf, unknownPictures, type PictureProblem } from '@shared/procedures/pictures';
import { ApiError } from '../http/api-error';
import { ProcedurePicture } from './procedure-picture.entity';

/** The document's pictures that are not stored in the shop, each with its field and what to do. */
export async function missingPictures(em: EntityManager, shopId: string, document: ProcedureDocument): Promise<PictureProblem[]> {
  const ids = pictureIdsOf(document);
  if (!ids.length) return [];
  const found = await em.getRepository(ProcedurePicture).find({ where: { shopId, id: In(ids) }, select: { id: true } });
  return unknownPictures(document, new Set(found.map((p) => p.id)));
}

/** Refuses a document that shows a picture this shop does not have, naming each field. */
export async function requireStoredPictures(em: EntityManager, shopId: string, document: ProcedureDocument): Promise<void> {
  const problems = await missingPictures(em, shopId, document);
  if (!problems.length) return;
  const more = problems.length > 1 ? ` (and ${problems.length - 1} more)` : '';
  throw new ApiError(400, 'unknown_picture', `${problems[0].message}${more}`, Object.fromEntries(problems.slice(0, 100).map((p) => [p.field, p.message])));
}
