import crypto from 'node:crypto';
import type { Response } from 'express';
import type { EntityManager } from 'typeorm';
import type { AppContext } from '../app-context';
import { ApiError } from '../http/api-error';
import type { AuthedRequest } from '../http/route';
import { IdempotencyRecord } from './idempotency-record.entity';

const KEY = /^[A-Za-z0-9_-]{8,100}$/;

export interface Answer {
  status: number;
  body: unknown;
}

/**
 * Runs a write once per Idempotency-Key: the first call's answer is stored in
 * the same transaction as its writes; a retry with the same key and body gets
 * that answer again; the same key with another body is refused. Without a key
 * the write simply runs.
 */
export async function answerOnce(ctx: AppContext, req: AuthedRequest, res: Response, work: (tx: EntityManager) => Promise<Answer>) {
  const key = req.get('idempotency-key');
  if (key !== undefined && !KEY.test(key)) {
    throw new ApiError(400, 'invalid_idempotency_key', 'Idempotency-Key is 8 to 100 letters, digits, - or _.');
  }
  const fingerprint = `${req.method} ${req.originalUrl.split('?')[0]} ${crypto.createHash('sha256').update(JSON.stringify(req.body ?? null)).digest('hex')}`;
  const answer = await ctx.write(async (tx) => {
    if (key) {
      const previous = await tx.getRepository(IdempotencyRecord).findOneBy({ shopId: req.member.shopId, userId: req.member.id, key });
      if (previous) {
        if (previous.fingerprint !== fingerprint) {
          throw new ApiError(422, 'idempotency_key_reused', 'This Idempotency-Key was already used for a different request. Send a new key.');
        }
        return { status: previous.status, body: previous.body, replayed: true };
      }
    }
    const fresh = await work(tx);
    if (key) {
      await tx.getRepository(IdempotencyRecord).insert({ shopId: req.member.shopId, userId: req.member.id, key, fingerprint, status: fresh.status, body: fresh.body as object });
    }
    return { ...fresh, replayed: false };
  });
  if (answer.replayed) res.setHeader('Idempotent-Replayed', 'true');
  res.status(answer.status).json(answer.body);
}
