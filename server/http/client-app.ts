import path from 'node:path';
import express, { Router } from 'express';

/**
 * Serves the built Angular app: its files as they are, and index.html for every other GET so the
 * client's router can take deep links. Registered after /api, so API paths never reach it.
 */
export function clientApp(dir: string): Router {
  const router = Router();
  const index = path.join(dir, 'index.html');
  router.use(express.static(dir, { index: false }));
  router.get('/{*splat}', (_req, res, next) => {
    res.sendFile(index, { headers: { 'Cache-Control': 'no-cache' } }, (err?: NodeJS.ErrnoException) => {
      if (!err) return;
      if (err.code !== 'ENOENT' || res.headersSent) return next(err);
      res
        .status(503)
        .type('text/plain')
        .send(`The web app is not built (no ${index}). Run "npm run build", or "npm start", which builds first.`);
    });
  });
  return router;
}
