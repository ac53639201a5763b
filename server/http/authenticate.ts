import type Database from 'better-sqlite3';
import type { RequestHandler } from 'express';
import type { Role } from '@shared/auth/roles';
import type { AppContext } from '../app-context';
import { dateFromSql } from '../db/sql-values';
import { sqliteOf } from '../db/writer';
import { Shop } from '../shops/shop.entity';
import { User } from '../users/user.entity';
import { ApiError } from './api-error';
import type { AuthedRequest } from './route';
import { verifySessionToken } from './verified-tokens';

interface MemberRow {
  id: string;
  shopId: string;
  email: string;
  name: string;
  role: Role;
  active: number;
  sessionEpoch: number;
  createdAt: string;
  shopName: string;
}

const lookups = new WeakMap<object, Database.Statement>();

/** One prepared lookup per request: it runs on every API call. */
function memberLookup(ctx: AppContext): Database.Statement {
  const db = sqliteOf(ctx.ds);
  let stmt = lookups.get(db);
  if (!stmt) {
    stmt = db.prepare('SELECT u.id, u.shopId, u.email, u.name, u.role, u.active, u.sessionEpoch, u.createdAt, s.name AS shopName FROM user u JOIN shop s ON s.id = u.shopId WHERE u.id = ?');
    lookups.set(db, stmt);
  }
  return stmt;
}

function toUser(row: MemberRow): User {
  const shop = Object.assign(new Shop(), { id: row.shopId, name: row.shopName });
  return Object.assign(new User(), { id: row.id, shopId: row.shopId, email: row.email, name: row.name, role: row.role, active: row.active === 1, sessionEpoch: row.sessionEpoch, createdAt: dateFromSql(row.createdAt), shop });
}

/**
 * Checks the bearer token (its signature once per token, see
 * verifySessionToken), then loads the member on every request so a role change
 * or a deactivation takes effect at once, and a raised session epoch (a password
 * reset, signing out everywhere) ends the older sessions.
 */
export function authenticate(ctx: AppContext, roles: readonly Role[]): RequestHandler {
  return (req, _res, next) => {
    const header = req.get('authorization') ?? '';
    const match = /^Bearer ([A-Za-z0-9._-]{10,2000})$/.exec(header);
    if (!match) throw new ApiError(401, 'unauthenticated', 'Sign in to continue.');
    const claims = verifySessionToken(ctx, match[1]);
    if (!claims) throw new ApiError(401, 'invalid_token', 'Your session has expired or is not valid. Sign in again.');
    const row = memberLookup(ctx).get(claims.sub) as MemberRow | undefined;
    if (!row || row.shopId !== claims.shop || row.sessionEpoch !== claims.ep) {
      throw new ApiError(401, 'invalid_token', 'Your session is not valid any more. Sign in again.');
    }
    if (!row.active) throw new ApiError(401, 'deactivated', 'This account has been deactivated. Ask the shop owner.');
    if (!roles.includes(row.role)) {
      throw new ApiError(403, 'forbidden', 'Your role does not allow this. Ask the shop owner if you need it.');
    }
    (req as AuthedRequest).member = toUser(row);
    next();
  };
}
