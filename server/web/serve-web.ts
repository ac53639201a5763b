import path from 'node:path';
import express from 'express';
import { prepareIndexHtml } from './index-html';

/** Where the export puts its content-hashed files: the JS chunks and the assets. */
const HASHED = /^\/(_expo|assets)\//;

/**
 * Serves the web export: hashed chunks and assets are cached for a year,
 * index.html is revalidated, and any other non-API path answers index.html so
 * deep links survive a reload.
 */
export function serveWeb(app: express.Express, webDir: string) {
  const index = prepareIndexHtml(webDir);
  app.use(
    express.static(webDir, {
      index: false,
      setHeaders(res, file) {
        if (HASHED.test('/' + path.relative(webDir, file).split(path.sep).join('/'))) {
          res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
        } else {
          res.setHeader('Cache-Control', 'no-cache');
        }
      },
    }),
  );
  app.get('/{*splat}', (req, res, next) => {
    // A hashed file that isn't there (a chunk of an older export) must fail as missing, never load the page as script.
    if (HASHED.test(req.path)) return void res.status(404).type('text').send('Not found');
    if (index === null) return next();
    res.setHeader('Cache-Control', 'no-cache');
    res.type('html').send(index);
  });
}
