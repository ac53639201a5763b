import crypto from 'node:crypto';
import { photoFieldsSchema, PHOTOS_PER_DIAGNOSIS } from '@shared/photos/schemas';
import { DiagnosisStep } from '../diagnoses/diagnosis-step.entity';
import { Diagnosis } from '../diagnoses/diagnosis.entity';
import { ApiError, notFound } from '../http/api-error';
import type { RouteDef } from '../http/route';
import { answerOnce } from '../idempotency/with-idempotency';
import { DiagnosisPhoto } from './photo.entity';
import { removePhoto, storePhoto } from './photo-storage';
import { toPhotoView } from './photo-views';
import { receivePhoto } from './receive-photo';
import { sendPicture } from './send-picture';

export const photoRoutes: RouteDef[] = [
  {
    method: 'post',
    path: '/api/diagnoses/:id/photos',
    summary:
      'Attach a photo to a step (field "stepId") or to the whole diagnosis: multipart/form-data, the picture in the field "photo", JPEG, PNG or WebP by its content, at most 10 MB. Open and concluded diagnoses take photos (a concluded one for proof of the repair); abandoned ones do not. Honours Idempotency-Key.',
    roles: ['owner', 'lead', 'tech'],
    async handler(req, res, ctx) {
      const photo = await receivePhoto(req, res);
      const fields = await photoFieldsSchema.validate(req.body ?? {}, { abortEarly: false });
      const shopId = req.member.shopId;
      const sha256 = crypto.createHash('sha256').update(photo.bytes).digest('hex');
      await answerOnce(
        ctx,
        req,
        res,
        async (tx) => {
          const d = await tx.getRepository(Diagnosis).findOneBy({ id: String(req.params.id), shopId });
          if (!d) throw notFound('diagnosis');
          if (d.status === 'abandoned') throw new ApiError(409, 'diagnosis_abandoned', 'This diagnosis was abandoned; it takes no more photos.');
          if (fields.stepId && !(await tx.getRepository(DiagnosisStep).existsBy({ id: fields.stepId, diagnosisId: d.id }))) {
            throw new ApiError(404, 'not_found', 'No step with that id in this diagnosis.', { stepId: 'Pick a step of this diagnosis.' });
          }
          const photos = tx.getRepository(DiagnosisPhoto);
          if ((await photos.countBy({ diagnosisId: d.id })) >= PHOTOS_PER_DIAGNOSIS) {
            throw new ApiError(409, 'too_many_photos', `This diagnosis already has ${PHOTOS_PER_DIAGNOSIS} photos, the most it can hold.`);
          }
          const storageKey = await storePhoto(ctx.config.dataDir, shopId, photo.bytes, photo.contentType);
          try {
            const saved = await photos.save({
              shopId,
              diagnosisId: d.id,
              stepId: fields.stepId ?? null,
              storageKey,
              contentType: photo.contentType,
              size: photo.bytes.length,
              uploadedById: req.member.id,
            });
            return { status: 201, body: { photo: toPhotoView(saved) } };
          } catch (err) {
            await removePhoto(ctx.config.dataDir, shopId, storageKey);
            throw err;
          }
        },
        { fields, sha256 },
      );
    },
  },
  {
    method: 'get',
    path: '/api/photos/:id',
    summary: 'The bytes of a photo, with its content type; private to the shop. Apprentices get photos of concluded diagnoses only.',
    roles: ['owner', 'lead', 'tech', 'apprentice'],
    async handler(req, res, ctx) {
      const photo = await ctx.ds.getRepository(DiagnosisPhoto).findOne({
        where: { id: String(req.params.id), shopId: req.member.shopId },
        relations: { diagnosis: true },
      });
      if (!photo || (req.member.role === 'apprentice' && photo.diagnosis.status !== 'concluded')) throw notFound('photo');
      await sendPicture(res, ctx.config.dataDir, photo, 'photo');
    },
  },
];
