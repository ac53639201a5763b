import jwt from 'jsonwebtoken';
import type { SignInResponse } from '@shared/api/types';
import type { AppContext } from '../app-context';
import type { User } from '../users/user.entity';
import { toSessionUser } from '../users/user-views';

interface Claims {
  sub: string;
  shop: string;
  /** The member's session epoch when the token was issued; a later epoch ends the session. */
  ep: number;
}

/** What a valid session token says: the member, their shop, and when it expires (seconds since 1970). */
export interface SessionClaims extends Claims {
  exp: number;
}

export function issueSession(ctx: AppContext, user: User & { shop: { name: string } }): SignInResponse {
  const token = jwt.sign({ shop: user.shopId, ep: user.sessionEpoch } satisfies Omit<Claims, 'sub'>, ctx.jwtKey, {
    subject: user.id,
    expiresIn: ctx.config.jwtTtl as jwt.SignOptions['expiresIn'],
    algorithm: 'HS256',
  });
  const { exp } = jwt.decode(token) as { exp: number };
  return { token, expiresAt: new Date(exp * 1000).toISOString(), user: toSessionUser(user) };
}

/** Returns the claims, or null for a missing, tampered, expired or malformed token. */
export function readSessionToken(ctx: AppContext, token: string): SessionClaims | null {
  try {
    const claims = jwt.verify(token, ctx.jwtKey, { algorithms: ['HS256'] });
    if (typeof claims !== 'object' || typeof claims.sub !== 'string' || typeof claims.shop !== 'string' || typeof claims.exp !== 'number') return null;
    // Tokens issued before epochs existed belong to epoch 0, where every member started.
    const ep = claims.ep ?? 0;
    if (!Number.isInteger(ep)) return null;
    return { sub: claims.sub, shop: claims.shop, ep, exp: claims.exp };
  } catch {
    return null;
  }
}
