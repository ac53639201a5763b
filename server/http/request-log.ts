import type { Express } from 'express';
import type { Logger } from 'pino';
import type { AuthedRequest } from './route';

declare module 'http' {
  interface IncomingMessage {
    /** Numbers the requests since start; in every line logged about the request. */
    id: number;
    /** The app's logger bound to the request id, made on first use. */
    log: Logger;
  }
}

const child = Symbol('request logger');

/**
 * One line per API request once its answer is sent or the client went away:
 * method, path, status, time and member, never headers or body (they carry the
 * bearer token and passwords). `req.log` is for handlers that log a failure; it
 * costs nothing on requests that log nothing.
 */
export function useRequestLog(app: Express, log: Logger) {
  Object.defineProperty(app.request, 'log', {
    get(this: { id: number; [child]?: Logger }) {
      return (this[child] ??= log.child({ reqId: this.id }));
    },
  });
  let lastId = 0;
  app.use((req, res, next) => {
    req.id = ++lastId;
    if (req.url.startsWith('/api/') && log.isLevelEnabled('info')) {
      const start = performance.now();
      res.once('close', () => {
        log.info(
          {
            reqId: req.id,
            method: req.method,
            path: req.originalUrl.split('?')[0],
            status: res.writableFinished ? res.statusCode : undefined,
            ms: Math.round((performance.now() - start) * 10) / 10,
            member: (req as Partial<AuthedRequest>).member?.id,
          },
          res.writableFinished ? 'request done' : 'request aborted',
        );
      });
    }
    next();
  });
}
