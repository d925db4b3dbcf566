import express, { type RequestHandler, Router } from 'express';
import { existsSync } from 'node:fs';
import path from 'node:path';

// The service worker and its manifest must be re-checked on every load, or tablets keep an old app.
const NEVER_CACHE = new Set(['/index.html', '/ngsw-worker.js', '/ngsw.json', '/safety-worker.js', '/worker-basic.min.js', '/manifest.webmanifest']);

/** Serves the built Angular app with long caching for hashed files and index.html for app routes. */
export function staticApp(browserDist: string): Router {
  const router = Router();
  const indexFile = path.join(browserDist, 'index.html');
  router.use(
    express.static(browserDist, {
      index: false,
      setHeaders(res, filePath) {
        const relative = `/${path.relative(browserDist, filePath).split(path.sep).join('/')}`;
        res.setHeader('Cache-Control', NEVER_CACHE.has(relative) ? 'no-cache' : 'public, max-age=31536000, immutable');
      },
    }),
  );
  const appShell: RequestHandler = (req, res, next) => {
    if (req.method !== 'GET' || req.path.startsWith('/api/') || path.extname(req.path)) return next();
    if (!existsSync(indexFile)) {
      res.status(503).type('text').send('The Dwell app has not been built yet. Run `npm start` (it builds the app) or `npm run build`.');
      return;
    }
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(indexFile);
  };
  router.use(appShell);
  return router;
}
