import type { KeyObject } from 'node:crypto';
import type { AppContext } from '../app-context';
import { readSessionToken, type SessionClaims } from '../auth/session-token';

const LIMIT = 2000;

/** Tokens whose signature was checked, per signing key, most recently used last. */
const verified = new WeakMap<KeyObject, Map<string, SessionClaims>>();

/** Valid until the second of `exp`, as jsonwebtoken counts it. */
const unexpired = (c: SessionClaims, now: number) => Math.floor(now / 1000) < c.exp;

/**
 * `readSessionToken` with its answer kept until the token expires, so the
 * signature of a member's token is checked once rather than on every request.
 * Only the token's own verdict is kept: role, deactivation and shop are still
 * read from the database on every request by `authenticate`. Bounded: the
 * least recently used token is forgotten first (and simply verified again).
 */
export function verifySessionToken(ctx: AppContext, token: string, now = Date.now()): SessionClaims | null {
  let cache = verified.get(ctx.jwtKey);
  if (!cache) verified.set(ctx.jwtKey, (cache = new Map()));
  const hit = cache.get(token);
  if (hit) {
    cache.delete(token);
    if (!unexpired(hit, now)) return null;
    cache.set(token, hit);
    return hit;
  }
  const claims = readSessionToken(ctx, token);
  if (!claims) return null;
  if (cache.size >= LIMIT) cache.delete(cache.keys().next().value!);
  cache.set(token, claims);
  return claims;
}
