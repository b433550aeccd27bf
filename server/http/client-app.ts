import { readFile } from 'node:fs/promises';
import path from 'node:path';
import express, { Router } from 'express';
import { CSP_NONCE_PLACEHOLDER } from './security-headers';

/**
 * Serves the built Angular app: its files as they are, and index.html for every other GET so the
 * client's router can take deep links, with this answer's CSP nonce in place of the placeholder
 * (security-headers.ts). Registered after /api, so API paths never reach it.
 */
export function clientApp(dir: string): Router {
  const router = Router();
  const index = path.join(dir, 'index.html');
  const page: express.RequestHandler = async (_req, res) => {
    const html = await readFile(index, 'utf8').catch((err: NodeJS.ErrnoException) => {
      if (err.code !== 'ENOENT') throw err;
      return undefined;
    });
    if (html === undefined) {
      res
        .status(503)
        .type('text/plain')
        .send(`The web app is not built (no ${index}). Run "npm run build", or "npm start", which builds first.`);
      return;
    }
    res.set('Cache-Control', 'no-cache').type('html').send(html.replaceAll(CSP_NONCE_PLACEHOLDER, res.locals.cspNonce as string));
  };
  // index.html asked for by name gets its nonce too.
  router.get('/index.html', page);
  router.use(express.static(dir, { index: false }));
  router.get('/{*splat}', page);
  return router;
}
