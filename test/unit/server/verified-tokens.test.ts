import crypto from 'node:crypto';
import jwt from 'jsonwebtoken';
import { describe, expect, it } from 'vitest';
import type { AppContext } from '@server/app-context';
import { verifySessionToken } from '@server/http/verified-tokens';

const ctxWith = (secret: string) => ({ jwtKey: crypto.createSecretKey(Buffer.from(secret)) }) as AppContext;
const sign = (ctx: AppContext, exp: number, sub = 'member-1') => jwt.sign({ shop: 'shop-1', exp }, ctx.jwtKey, { subject: sub, algorithm: 'HS256' });

describe('session tokens verified once per token', () => {
  const ctx = ctxWith('unit-secret-'.padEnd(48, 'x'));
  const now = Date.now();
  const exp = Math.floor(now / 1000) + 3600;

  it('answers the claims of a valid token, the same on a repeat', () => {
    const token = sign(ctx, exp);
    expect(verifySessionToken(ctx, token, now)).toEqual({ sub: 'member-1', shop: 'shop-1', ep: 0, exp });
    expect(verifySessionToken(ctx, token, now + 1000)).toEqual({ sub: 'member-1', shop: 'shop-1', ep: 0, exp });
  });

  it('reads the session epoch a token was issued in; a token from before epochs belongs to epoch 0; a malformed one is refused', () => {
    const withEpoch = jwt.sign({ shop: 'shop-1', ep: 3, exp }, ctx.jwtKey, { subject: 'member-9', algorithm: 'HS256' });
    expect(verifySessionToken(ctx, withEpoch, now)?.ep).toBe(3);
    expect(verifySessionToken(ctx, sign(ctx, exp, 'member-10'), now)?.ep).toBe(0);
    const malformed = jwt.sign({ shop: 'shop-1', ep: 'x', exp }, ctx.jwtKey, { subject: 'member-11', algorithm: 'HS256' });
    expect(verifySessionToken(ctx, malformed, now)).toBeNull();
  });

  it('refuses a remembered token from the second of its expiry on, as jsonwebtoken does', () => {
    const token = sign(ctx, exp, 'member-2');
    expect(verifySessionToken(ctx, token, now)).not.toBeNull();
    expect(verifySessionToken(ctx, token, exp * 1000 - 1)).not.toBeNull();
    expect(verifySessionToken(ctx, token, exp * 1000)).toBeNull();
  });

  it('refuses a token with a changed payload even after the genuine one was remembered', () => {
    const token = sign(ctx, exp, 'member-3');
    expect(verifySessionToken(ctx, token, now)).not.toBeNull();
    const [head, , sig] = token.split('.');
    const forged = `${head}.${Buffer.from(JSON.stringify({ shop: 'shop-2', sub: 'member-3', exp })).toString('base64url')}.${sig}`;
    expect(verifySessionToken(ctx, forged, now)).toBeNull();
  });

  it('does not carry a token over to another signing key', () => {
    const token = sign(ctx, exp, 'member-4');
    expect(verifySessionToken(ctx, token, now)).not.toBeNull();
    expect(verifySessionToken(ctxWith('other-secret-'.padEnd(48, 'y')), token, now)).toBeNull();
  });

  it('still verifies tokens after more have been seen than it keeps', () => {
    const first = sign(ctx, exp, 'member-0');
    expect(verifySessionToken(ctx, first, now)?.sub).toBe('member-0');
    for (let i = 0; i < 2100; i++) verifySessionToken(ctx, sign(ctx, exp, `filler-${i}`), now);
    expect(verifySessionToken(ctx, first, now)?.sub).toBe('member-0');
    expect(verifySessionToken(ctx, `${first}x`, now)).toBeNull();
  });
});
