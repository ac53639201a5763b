import type { Request, Response } from 'express';
import type * as yup from 'yup';
import type { Role } from '@shared/auth/roles';
import type { AppContext } from '../app-context';
import type { User } from '../users/user.entity';

export type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';

/** A request that passed authentication: the member and their shop come from the token. */
export interface AuthedRequest extends Request {
  member: User;
}

export interface RouteDef {
  method: Method;
  path: string;
  summary: string;
  /** The roles allowed (every other role gets 403, no token 401), or 'public' for no sign-in. */
  roles: readonly Role[] | 'public';
  /** Request body schema (the same yup schema the client form uses). */
  body?: yup.AnyObjectSchema;
  /** Stricter rate limit for endpoints that guess at secrets or send mail. */
  limited?: boolean;
  /** `req.member` is set on every route but the public ones, which must not read it. */
  handler: (req: AuthedRequest, res: Response, ctx: AppContext) => unknown;
}

export const ALL_ROLES: readonly Role[] = ['owner', 'lead', 'tech', 'apprentice'];
