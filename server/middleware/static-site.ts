/**
 * Serves the Expo web export: hashed bundles cached for a year, everything else revalidated, and every
 * non-API GET that is not a file answered with index.html so deep links work (STACK.md pitfalls 5 and 6).
 */
import fs from 'node:fs';
import path from 'node:path';
import express, { type Router } from 'express';

// Expo puts content-hashed bundles under _expo/static and hashed assets under assets/ (name.<md5>[@2x].ext).
const HASHED = /(^|\/)_expo\/static\/|\.[0-9a-f]{16,}(@\d+(\.\d+)?x)?\.[a-z0-9]+$/i;

export function staticSite(distDir: string): Router {
  const router = express.Router();
  router.use(
    express.static(distDir, {
      index: false,
      dotfiles: 'ignore',
      setHeaders(res, filePath) {
        const rel = path.relative(distDir, filePath).split(path.sep).join('/');
        res.setHeader('Cache-Control', HASHED.test(rel) ? 'public, max-age=31536000, immutable' : 'no-cache');
      },
    }),
  );
  router.get('/{*path}', (req, res, next) => {
    if (req.path === '/api' || req.path.startsWith('/api/')) return next();
    if (!fs.existsSync(path.join(distDir, 'index.html'))) {
      res
        .status(503)
        .type('text/plain')
        .send('The web app has not been built yet. Run `npm run build:web` (or `npm start`), then reload.');
      return;
    }
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile('index.html', { root: distDir });
  });
  return router;
}
