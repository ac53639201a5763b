import crypto from 'node:crypto';
import { PICTURE_MAX_BYTES } from '@shared/procedures/pictures';
import type { ProcedurePictureView } from '@shared/api/procedure-types';
import { notFound } from '../http/api-error';
import type { RouteDef } from '../http/route';
import { answerOnce } from '../idempotency/with-idempotency';
import { removePhoto, storePhoto } from '../photos/photo-storage';
import { pictureReceiver } from '../photos/receive-photo';
import { sendPicture } from '../photos/send-picture';
import { Procedure } from '../procedures/procedure.entity';
import { ProcedurePicture } from './procedure-picture.entity';

const receivePicture = pictureReceiver({
  field: 'picture',
  maxBytes: PICTURE_MAX_BYTES,
  noun: 'picture',
  tooLargeHint: 'Save it at a lower resolution or pick a smaller file.',
  textFields: 0,
  fieldsHint: 'Send only the picture, in the field “picture”.',
});

const view = (p: ProcedurePicture): ProcedurePictureView => ({ id: p.id, contentType: p.contentType, size: p.size, createdAt: p.createdAt.toISOString() });

export const procedurePictureRoutes: RouteDef[] = [
  {
    method: 'post',
    path: '/api/procedures/:id/pictures',
    summary:
      'Upload a picture for the checks of a procedure (a diagram or a photo): multipart/form-data, the file in the field "picture", JPEG, PNG or WebP by its content, at most 5 MB. A check shows it by putting its id in pictures[].src. Pictures are never deleted. Honours Idempotency-Key.',
    roles: ['owner', 'lead'],
    async handler(req, res, ctx) {
      const picture = await receivePicture(req, res);
      const shopId = req.member.shopId;
      const sha256 = crypto.createHash('sha256').update(picture.bytes).digest('hex');
      await answerOnce(
        ctx,
        req,
        res,
        async (tx) => {
          if (!(await tx.getRepository(Procedure).existsBy({ id: String(req.params.id), shopId }))) throw notFound('procedure');
          const storageKey = await storePhoto(ctx.config.dataDir, shopId, picture.bytes, picture.contentType);
          try {
            const saved = await tx.getRepository(ProcedurePicture).save({
              shopId,
              procedureId: String(req.params.id),
              storageKey,
              contentType: picture.contentType,
              size: picture.bytes.length,
              uploadedById: req.member.id,
            });
            return { status: 201, body: { picture: view(saved) } };
          } catch (err) {
            await removePhoto(ctx.config.dataDir, shopId, storageKey);
            throw err;
          }
        },
        { sha256 },
      );
    },
  },
  {
    method: 'get',
    path: '/api/procedure-pictures/:id',
    summary: 'The bytes of a procedure picture, with its content type; every member of the shop may see it (apprentices replay the checks that show it).',
    roles: ['owner', 'lead', 'tech', 'apprentice'],
    async handler(req, res, ctx) {
      const picture = await ctx.ds.getRepository(ProcedurePicture).findOneBy({ id: String(req.params.id), shopId: req.member.shopId });
      if (!picture) throw notFound('picture');
      await sendPicture(res, ctx.config.dataDir, picture, 'picture');
    },
  },
];
