import express from 'express';
import helmet, { type HelmetOptions } from 'helmet';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { securityHeaders } from '@server/http/security-headers';

const OPTIONS: HelmetOptions = { contentSecurityPolicy: { directives: { 'default-src': ["'self'"], 'img-src': ["'self'", 'data:'] } } };

async function headersWith(middleware: express.RequestHandler) {
  const app = express();
  app.disable('x-powered-by');
  app.use(middleware);
  app.get('/x', (_req, res) => res.json({ ok: true }));
  const res = await request(app).get('/x');
  const { date: _date, ...rest } = res.headers;
  return rest;
}

describe('security headers worked out once', () => {
  it('sends exactly the headers helmet sends for the same options', async () => {
    const ours = await headersWith(securityHeaders(OPTIONS));
    expect(ours).toEqual(await headersWith(helmet(OPTIONS)));
    expect(ours['content-security-policy']).toContain("img-src 'self' data:");
    expect(ours['x-content-type-options']).toBe('nosniff');
  });
});
