import path from 'node:path';
import express from 'express';
import { prepareIndexHtml } from './index-html';

/**
 * Serves the web export: hashed bundles and assets are cached for a year,
 * index.html is revalidated, and any non-API path answers index.html so deep
 * links survive a reload.
 */
export function serveWeb(app: express.Express, webDir: string) {
  const index = prepareIndexHtml(webDir);
  app.use(
    express.static(webDir, {
      index: false,
      setHeaders(res, file) {
        const rel = path.relative(webDir, file);
        if (rel.startsWith('_expo') || rel.startsWith('assets')) {
          res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
        } else {
          res.setHeader('Cache-Control', 'no-cache');
        }
      },
    }),
  );
  app.get('/{*splat}', (_req, res, next) => {
    if (index === null) return next();
    res.setHeader('Cache-Control', 'no-cache');
    res.type('html').send(index);
  });
}
