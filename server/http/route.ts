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

interface BaseRoute {
  method: Method;
  path: string;
  summary: string;
  /** Request body schema (the same yup schema the client form uses). */
  body?: yup.AnyObjectSchema;
  /** Stricter rate limit for endpoints that guess at secrets or send mail. */
  limited?: boolean;
}

export interface PublicRoute extends BaseRoute {
  roles: 'public';
  handler: (req: Request, res: Response, ctx: AppContext) => unknown;
}

export interface MemberRoute extends BaseRoute {
  /** The roles allowed; every other role gets 403, no token 401. */
  roles: readonly Role[];
  handler: (req: AuthedRequest, res: Response, ctx: AppContext) => unknown;
}

export type RouteDef = PublicRoute | MemberRoute;

export const ALL_ROLES: readonly Role[] = ['owner', 'lead', 'tech', 'apprentice'];
