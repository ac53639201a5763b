import path from 'node:path';
import compression from 'compression';
import express, { type RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type { AppContext } from './app-context';
import { authenticate } from './http/authenticate';
import { apiNotFound, errorMiddleware } from './http/error-middleware';
import type { AuthedRequest, RouteDef } from './http/route';
import { useRequestLog } from './http/request-log';
import { securityHeaders } from './http/security-headers';
import { validateBody } from './http/validate';
import { routeTable } from './route-table';
import { serveWeb } from './web/serve-web';

export interface AppOptions {
  /** Folder of the web export to serve; omitted in API tests. */
  webDir?: string;
  /** Requests allowed per window on limited routes (sign-in counts failures only). */
  rateLimit?: { windowMs: number; limit: number };
}

const BODY_LIMIT = '256kb';

/** Builds the Express app without listening, so tests can drive it with supertest. */
export function createApp(ctx: AppContext, options: AppOptions = {}) {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', false);
  app.set('query parser', 'simple');
  useRequestLog(app, ctx.log);
  app.use(
    securityHeaders({
      contentSecurityPolicy: {
        directives: {
          'default-src': ["'self'"],
          'script-src': ["'self'"],
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'font-src': ["'self'", 'data:'],
          'connect-src': ["'self'"],
        },
      },
    }),
  );
  // Write answers are a few hundred bytes, under compression's threshold; lists, documents and the web build are read with GET.
  const compress = compression();
  app.use((req, res, next) => (req.method === 'GET' || req.method === 'HEAD' ? compress(req, res, next) : next()));
  app.use('/api', express.json({ limit: BODY_LIMIT, strict: true }));

  const limits = options.rateLimit ?? { windowMs: 15 * 60 * 1000, limit: 10 };
  for (const route of routeTable) mount(app, ctx, route, limits);
  app.use('/api', apiNotFound);

  if (options.webDir) serveWeb(app, path.resolve(options.webDir));
  app.use(errorMiddleware);
  return app;
}

function mount(app: express.Express, ctx: AppContext, route: RouteDef, limits: { windowMs: number; limit: number }) {
  const chain: RequestHandler[] = [];
  if (route.limited) chain.push(limiterFor(route, limits));
  if (route.roles !== 'public') chain.push(authenticate(ctx, route.roles));
  if (route.body) chain.push(validateBody(route.body));
  chain.push(async (req, res) => {
    await route.handler(req as AuthedRequest, res, ctx);
  });
  app[route.method](route.path, ...chain);
}

function limiterFor(route: RouteDef, limits: { windowMs: number; limit: number }): RequestHandler {
  const signIn = route.path === '/api/auth/sign-in';
  return rateLimit({
    windowMs: limits.windowMs,
    // Sign-in counts only failures, per address and e-mail; other routes count every call per address.
    limit: signIn ? limits.limit : limits.limit * 3,
    skipSuccessfulRequests: signIn,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) => {
      const ip = ipKeyGenerator(req.ip ?? 'unknown');
      if (!signIn) return `${route.path}|${ip}`;
      const email = typeof req.body?.email === 'string' ? req.body.email.trim().toLowerCase().slice(0, 254) : '';
      return `${route.path}|${ip}|${email}`;
    },
    handler: (_req, res) => {
      res.status(429).json({ error: { code: 'rate_limited', message: 'Too many attempts. Wait a few minutes and try again.' } });
    },
  });
}
