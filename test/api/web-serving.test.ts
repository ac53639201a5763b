import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createHarness, type Harness } from '../support/api-harness';

/** The web export served beside the API: deep links, caching, compression, preloaded fonts. */
let h: Harness;
const webDir = fs.mkdtempSync(path.join(os.tmpdir(), 'probepath-web-'));
const bundle = `console.log(${JSON.stringify('x'.repeat(20_000))});`;

beforeAll(async () => {
  fs.mkdirSync(path.join(webDir, '_expo/static/js/web'), { recursive: true });
  fs.mkdirSync(path.join(webDir, 'assets/fonts'), { recursive: true });
  fs.writeFileSync(path.join(webDir, 'index.html'), '<!DOCTYPE html><html><head><title>Probepath</title></head><body><div id="root"></div></body></html>');
  fs.writeFileSync(path.join(webDir, '_expo/static/js/web/entry-abc123.js'), bundle);
  fs.writeFileSync(path.join(webDir, 'assets/fonts/AtkinsonHyperlegibleNext-Regular.0a1b2c.ttf'), 'font');
  fs.writeFileSync(path.join(webDir, 'assets/fonts/JetBrainsMono-Bold.0a1b2c.ttf'), 'font');
  h = await createHarness({ webDir });
});
afterAll(async () => {
  await h.close();
  fs.rmSync(webDir, { recursive: true, force: true });
});

describe('web app', () => {
  it('answers any non-API path with index.html so a reload of a deep link works', async () => {
    const res = await request(h.app).get('/bench/diagnosis/123');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/html/);
    expect(res.headers['cache-control']).toBe('no-cache');
    expect(res.text).toContain('<div id="root">');
  });

  it('preloads the text fonts of the first screen, not the reading face', async () => {
    const res = await request(h.app).get('/');
    expect(res.text).toContain('<link rel="preload" href="/assets/fonts/AtkinsonHyperlegibleNext-Regular.0a1b2c.ttf" as="font"');
    expect(res.text).not.toContain('JetBrainsMono');
  });

  it('caches hashed bundles for a year and compresses them', async () => {
    const res = await request(h.app).get('/_expo/static/js/web/entry-abc123.js').set('accept-encoding', 'gzip');
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toContain('immutable');
    expect(res.headers['content-encoding']).toBe('gzip');
  });

  it('keeps unknown API paths as JSON 404s', async () => {
    const res = await request(h.app).get('/api/nothing-here');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });

  it('sends security headers with the page', async () => {
    const res = await request(h.app).get('/');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
    expect(res.headers['x-content-type-options']).toBe('nosniff');
  });
});
