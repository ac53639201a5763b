import type { IncomingMessage, ServerResponse } from 'node:http';
import type { RequestHandler } from 'express';
import helmet, { type HelmetOptions } from 'helmet';

/**
 * helmet's headers for these options, worked out once at start: they depend on
 * nothing in the request, so every answer gets the same list without running
 * helmet's dozen middlewares per request.
 */
export function securityHeaders(options: HelmetOptions): RequestHandler {
  const headers: [string, string][] = [];
  const recorder = {
    setHeader(name: string, value: string) {
      headers.push([name, value]);
    },
    removeHeader() {},
  };
  helmet(options)({} as IncomingMessage, recorder as unknown as ServerResponse, (err?: unknown) => {
    if (err) throw err;
  });
  return (_req, res, next) => {
    for (const [name, value] of headers) res.setHeader(name, value);
    next();
  };
}
