import jwt from 'jsonwebtoken';
import type { SignInResponse } from '@shared/api/types';
import type { AppContext } from '../app-context';
import type { User } from '../users/user.entity';
import { toSessionUser } from '../users/user-views';

interface Claims {
  sub: string;
  shop: string;
}

export function issueSession(ctx: AppContext, user: User & { shop: { name: string } }): SignInResponse {
  const token = jwt.sign({ shop: user.shopId } satisfies Omit<Claims, 'sub'>, ctx.jwtKey, {
    subject: user.id,
    expiresIn: ctx.config.jwtTtl as jwt.SignOptions['expiresIn'],
    algorithm: 'HS256',
  });
  const { exp } = jwt.decode(token) as { exp: number };
  return { token, expiresAt: new Date(exp * 1000).toISOString(), user: toSessionUser(user) };
}

/** Returns the claims, or null for a missing, tampered, expired or malformed token. */
export function readSessionToken(ctx: AppContext, token: string): Claims | null {
  try {
    const claims = jwt.verify(token, ctx.jwtKey, { algorithms: ['HS256'] });
    if (typeof claims !== 'object' || typeof claims.sub !== 'string' || typeof claims.shop !== 'string') return null;
    return { sub: claims.sub, shop: claims.shop };
  } catch {
    return null;
  }
}
