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
const CHUNKS = [
  '_expo/static/js/web/__expo-metro-runtime-0a1b2c.js',
  '_expo/static/js/web/__common-0a1b2c.js',
  '_expo/static/js/web/entry-abc123.js',
  '_expo/static/js/web/editor-screen-0a1b2c.js',
];

beforeAll(async () => {
  fs.mkdirSync(path.join(webDir, '_expo/static/js/web'), { recursive: true });
  fs.mkdirSync(path.join(webDir, 'assets/fonts'), { recursive: true });
  fs.writeFileSync(path.join(webDir, 'index.html'), '<!DOCTYPE html><html><head><title>Probepath</title></head><body><div id="root"></div></body></html>');
  // The export splits the app: a runtime, a common chunk, the entry, and a chunk per lazily loaded screen.
  for (const chunk of CHUNKS) fs.writeFileSync(path.join(webDir, chunk), bundle);
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

  it('caches every hashed chunk for a year and compresses it', async () => {
    for (const chunk of CHUNKS) {
      const res = await request(h.app).get(`/${chunk}`).set('accept-encoding', 'gzip');
      expect(res.status, chunk).toBe(200);
      expect(res.headers['cache-control'], chunk).toBe('public, max-age=31536000, immutable');
      expect(res.headers['content-encoding'], chunk).toBe('gzip');
    }
  });

  it('answers a chunk that is not there with a 404, not with the page', async () => {
    const res = await request(h.app).get('/_expo/static/js/web/editor-screen-ffffff.js');
    expect(res.status).toBe(404);
    expect(res.headers['content-type'] ?? '').not.toMatch(/html/);
  });

  it('keeps unknown API paths as JSON 404s', async () => {
    const res = await request(h.app).get('/api/nothing-here');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });

  it('sends security headers with the page', async () => {
    const res = await request(h.app).get('/');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
    // Lazily loaded screens come in as script tags from the same origin: no eval, no inline script.
    expect(res.headers['content-security-policy']).toContain("script-src 'self';");
    expect(res.headers['x-content-type-options']).toBe('nosniff');
  });
});
