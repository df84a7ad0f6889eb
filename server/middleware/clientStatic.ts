import express, { type Express } from 'express';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import type { Logger } from '../logger';

/**
 * Serves the built client: hashed files under assets/ are cached for a year, index.html never,
 * and every other GET outside /api gets index.html so client-side routes load on refresh.
 */
export function serveClient(app: Express, clientDist: string, logger: Logger): void {
  const indexFile = join(clientDist, 'index.html');
  if (!existsSync(indexFile)) {
    logger.warn(`The built client was not found at ${indexFile}. Run \`npm run build\`; until then pages answer 503.`);
  }
  app.use(
    express.static(clientDist, {
      index: false,
      setHeaders(res, filePath) {
        const hashed = /[\\/]assets[\\/]/.test(filePath);
        res.setHeader('Cache-Control', hashed ? 'public, max-age=31536000, immutable' : 'no-cache');
      },
    }),
  );
  app.get('/{*splat}', (req, res, next) => {
    if (req.path === '/api' || req.path.startsWith('/api/')) return next();
    // A missing hashed file is a stale page asking for an old build: say so instead of sending HTML.
    if (req.path.startsWith('/assets/')) return void res.status(404).type('text/plain').send('Not found');
    if (!existsSync(indexFile)) {
      res.status(503).type('text/plain').send('The Slotwise client has not been built yet. Run `npm run build`.');
      return;
    }
    res.setHeader('Cache-Control', 'no-cache');
    // dotfiles: allow — the build folder may sit under a dot-folder (e.g. .tmp/dist-x) in tests.
    res.sendFile(indexFile, { dotfiles: "allow" });
  });
}
