import { existsSync } from 'node:fs';
import path from 'node:path';
import express, { type Router } from 'express';

/**
 * Serve the exported web app (`npm run build:web`) with an SPA fallback: any GET that is not a file and
 * not under /api gets index.html, and the client router takes over. Hashed bundles are cached for a
 * year; index.html never, so a new build is picked up on the next load.
 */
const IMMUTABLE = 'public, max-age=31536000, immutable';
/** A content hash in a file name, as the export writes them: `entry-0f3c….js`, `Inter_400Regular.9a1b….ttf`. */
const HASHED_NAME = /[.-][0-9a-f]{16,}\.[a-z0-9]+$/i;

/**
 * Files whose name changes whenever their content does, so a browser may keep them for a year
 * without asking again (RFC 8246 `immutable`): everything under `_expo/static/` and any file named
 * by its content hash. The page and every other file are `no-cache`: kept, but checked each time.
 */
export function isHashedAsset(file: string): boolean {
  return file.includes(`${path.sep}_expo${path.sep}static${path.sep}`) || HASHED_NAME.test(path.basename(file));
}

export function webApp(webDir: string): Router {
  const router = express.Router();
  const index = path.join(webDir, 'index.html');
  // Checked per request: a server started before `npm run build:web` finished serves the build once it exists.
  router.use((req, res, next) => {
    if (existsSync(index)) return next();
    if (req.method !== 'GET' && req.method !== 'HEAD') return next();
    res.status(404).type('text/plain').send('The web app is not built yet. Run `npm run build:web` or `npm start`.');
  });
  router.use(
    express.static(webDir, {
      index: false,
      dotfiles: 'ignore',
      setHeaders(res, file) {
        res.setHeader('Cache-Control', isHashedAsset(file) ? IMMUTABLE : 'no-cache');
      },
    }),
  );
  router.get('/{*splat}', (req, res, next) => {
    // A missing file (an old bundle, a favicon) or a dotfile is a 404, not the app's HTML.
    if (path.extname(req.path) !== '' || path.basename(req.path).startsWith('.')) return next();
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(index);
  });
  return router;
}
