import crypto from 'node:crypto';
import type { Response } from 'express';
import type { EntityManager } from 'typeorm';
import type { AppContext } from '../app-context';
import { sqlDate } from '../db/sql-values';
import { sqliteOf } from '../db/writer';
import { ApiError } from '../http/api-error';
import type { AuthedRequest } from '../http/route';

const KEY = /^[A-Za-z0-9_-]{8,100}$/;

export interface Answer {
  status: number;
  body: unknown;
}

interface Attempt {
  key: string | undefined;
  fingerprint: string;
}

function attemptOf(req: AuthedRequest, content: unknown = req.body): Attempt {
  const key = req.get('idempotency-key');
  if (key !== undefined && !KEY.test(key)) {
    throw new ApiError(400, 'invalid_idempotency_key', 'Idempotency-Key is 8 to 100 letters, digits, - or _.');
  }
  const bodyHash = crypto.createHash('sha256').update(JSON.stringify(content ?? null)).digest('hex');
  return { key, fingerprint: `${req.method} ${req.originalUrl.split('?')[0]} ${bodyHash}` };
}

const statements = new WeakMap<object, { find: import('better-sqlite3').Statement; insert: import('better-sqlite3').Statement }>();

function store(ctx: AppContext) {
  const db = sqliteOf(ctx.ds);
  let s = statements.get(db);
  if (!s) {
    s = {
      find: db.prepare('SELECT fingerprint, status, body FROM idempotency_record WHERE shopId = ? AND userId = ? AND "key" = ?'),
      insert: db.prepare('INSERT INTO idempotency_record (id, shopId, userId, "key", fingerprint, status, body, createdAt) VALUES (?, ?, ?, ?, ?, ?, ?, ?)'),
    };
    statements.set(db, s);
  }
  return s;
}

/** Inside the write transaction: the stored answer for this key, or undefined when the key is new. */
function previousAnswer(ctx: AppContext, req: AuthedRequest, a: Attempt): Answer | undefined {
  if (!a.key) return undefined;
  const row = store(ctx).find.get(req.member.shopId, req.member.id, a.key) as { fingerprint: string; status: number; body: string } | undefined;
  if (!row) return undefined;
  if (row.fingerprint !== a.fingerprint) {
    throw new ApiError(422, 'idempotency_key_reused', 'This Idempotency-Key was already used for a different request. Send a new key.');
  }
  return { status: row.status, body: JSON.parse(row.body) };
}

function remember(ctx: AppContext, req: AuthedRequest, a: Attempt, answer: Answer) {
  if (a.key) store(ctx).insert.run(crypto.randomUUID(), req.member.shopId, req.member.id, a.key, a.fingerprint, answer.status, JSON.stringify(answer.body), sqlDate(new Date()));
}

function send(res: Response, answer: Answer, replayed: boolean) {
  if (replayed) res.setHeader('Idempotent-Replayed', 'true');
  res.status(answer.status).json(answer.body);
}

/**
 * Runs a write once per Idempotency-Key: the first call's answer is stored in
 * the same transaction as its writes; a retry with the same key and body gets
 * that answer again; the same key with another body is refused. Without a key
 * the write simply runs.
 */
export async function answerOnce(
  ctx: AppContext,
  req: AuthedRequest,
  res: Response,
  work: (tx: EntityManager) => Promise<Answer>,
  /** What the key stands for beyond method and path: the JSON body, or e.g. an upload's fields and file hash. */
  content: unknown = req.body,
) {
  const a = attemptOf(req, content);
  const result = await ctx.write(async (tx) => {
    const previous = previousAnswer(ctx, req, a);
    if (previous) return { answer: previous, replayed: true };
    const answer = await work(tx);
    remember(ctx, req, a, answer);
    return { answer, replayed: false };
  });
  send(res, result.answer, result.replayed);
}

/** The same, for a synchronous transaction of prepared statements (the step hot path). */
export async function answerOnceSync(ctx: AppContext, req: AuthedRequest, res: Response, work: () => Answer) {
  const a = attemptOf(req);
  const result = await ctx.writeSync(() => {
    const previous = previousAnswer(ctx, req, a);
    if (previous) return { answer: previous, replayed: true };
    const answer = work();
    remember(ctx, req, a, answer);
    return { answer, replayed: false };
  });
  send(res, result.answer, result.replayed);
}

const inFlight = new Map<string, Promise<unknown>>();

/**
 * For a write whose effect leaves the database and itself needs the write
 * queue (mail through the local fake files the message in the outbox table),
 * so it cannot run inside a queued transaction: the stored answer is looked up
 * first, the effect runs outside the queue, and its answer is stored after.
 * Requests with the same key wait for each other, so two retries never both
 * run the effect. A failed effect stores nothing, so a retry tries again.
 */
export async function answerOnceAfter(ctx: AppContext, req: AuthedRequest, res: Response, effect: () => Promise<Answer>) {
  const a = attemptOf(req);
  if (!a.key) return send(res, await effect(), false);
  const slot = `${req.member.shopId}|${req.member.id}|${a.key}`;
  while (inFlight.has(slot)) await inFlight.get(slot)!.catch(() => undefined);
  const run = (async () => {
    const previous = await ctx.writeSync(() => previousAnswer(ctx, req, a));
    if (previous) return { answer: previous, replayed: true };
    const answer = await effect();
    await ctx.writeSync(() => remember(ctx, req, a, answer));
    return { answer, replayed: false };
  })();
  inFlight.set(slot, run);
  try {
    const result = await run;
    send(res, result.answer, result.replayed);
  } finally {
    inFlight.delete(slot);
  }
}
