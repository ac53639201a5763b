import type { RequestHandler } from 'express';
import type { Role } from '@shared/auth/roles';
import type { AppContext } from '../app-context';
import { readSessionToken } from '../auth/session-token';
import { User } from '../users/user.entity';
import { ApiError } from './api-error';
import type { AuthedRequest } from './route';

/**
 * Checks the bearer token, then loads the member on every request so a role
 * change or a deactivation takes effect at once.
 */
export function authenticate(ctx: AppContext, roles: readonly Role[]): RequestHandler {
  return async (req, _res, next) => {
    const header = req.get('authorization') ?? '';
    const match = /^Bearer ([A-Za-z0-9._-]{10,2000})$/.exec(header);
    if (!match) throw new ApiError(401, 'unauthenticated', 'Sign in to continue.');
    const claims = readSessionToken(ctx, match[1]);
    if (!claims) throw new ApiError(401, 'invalid_token', 'Your session has expired or is not valid. Sign in again.');
    const user = await ctx.ds.getRepository(User).findOne({ where: { id: claims.sub }, relations: { shop: true } });
    if (!user || user.shopId !== claims.shop) {
      throw new ApiError(401, 'invalid_token', 'Your session is not valid any more. Sign in again.');
    }
    if (!user.active) throw new ApiError(401, 'deactivated', 'This account has been deactivated. Ask the shop owner.');
    if (!roles.includes(user.role)) {
      throw new ApiError(403, 'forbidden', 'Your role does not allow this. Ask the shop owner if you need it.');
    }
    (req as AuthedRequest).member = user;
    next();
  };
}
