import { Writable } from 'node:stream';
import express from 'express';
import pino from 'pino';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { useRequestLog } from '@server/http/request-log';

function appLogging(level: string) {
  const lines: Record<string, unknown>[] = [];
  const sink = new Writable({
    write(chunk, _enc, done) {
      lines.push(JSON.parse(String(chunk)));
      done();
    },
  });
  const app = express();
  useRequestLog(app, pino({ level }, sink));
  app.post('/api/things', express.json(), (req, res) => {
    if (req.body.fail) req.log.error({ reason: 'asked to' }, 'thing failed');
    res.status(201).json({ ok: true });
  });
  app.get('/page', (_req, res) => res.send('page'));
  return { app, lines };
}

describe('request log', () => {
  it('writes one line per API request with method, path, status and time, and never the headers, query or body', async () => {
    const { app, lines } = appLogging('info');
    await request(app).post('/api/things?secret=q1').set('authorization', 'Bearer tok.en.value').send({ password: 'hunter22' });
    await request(app).get('/page');
    await new Promise((r) => setTimeout(r, 20));
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatchObject({ method: 'POST', path: '/api/things', status: 201, msg: 'request done' });
    expect(typeof lines[0].ms).toBe('number');
    const text = JSON.stringify(lines);
    for (const secret of ['tok.en.value', 'hunter22', 'q1']) expect(text).not.toContain(secret);
  });

  it("ties a handler's own log line to the request line by its id", async () => {
    const { app, lines } = appLogging('info');
    await request(app).post('/api/things').send({ fail: true });
    await new Promise((r) => setTimeout(r, 20));
    const failure = lines.find((l) => l.msg === 'thing failed');
    const done = lines.find((l) => l.msg === 'request done');
    expect(failure?.reqId).toBeDefined();
    expect(failure?.reqId).toBe(done?.reqId);
  });

  it('logs nothing below its level', async () => {
    const { app, lines } = appLogging('warn');
    await request(app).post('/api/things').send({});
    await new Promise((r) => setTimeout(r, 20));
    expect(lines).toEqual([]);
  });
});
