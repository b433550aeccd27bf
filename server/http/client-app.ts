import { readFile } from 'node:fs/promises';
import path from 'node:path';
import express, { Router } from 'express';
import { CSP_NONCE_PLACEHOLDER, pageStyleNonce } from './security-headers';

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
    res.set('Cache-Control', 'no-cache').type('html').send(html.replaceAll(CSP_NONCE_PLACEHOLDER, pageStyleNonce(res)));
  };
  // index.html asked for by name gets its nonce too.
  router.get('/index.html', page);
  router.get('/ngsw.json', workerManifest(path.join(dir, 'ngsw.json')));
  router.use(express.static(dir, { index: false }));
  router.get('/{*splat}', page);
  return router;
}

/**
 * The offline worker's manifest (ngsw.json, written by the production build) without index.html's hash:
 * index.html is rewritten for every answer (its nonce), so no hash could match it and the worker would
 * refuse the whole version. Unhashed, the worker keeps the copy it fetched (nonce and policy header of
 * one answer, which agree) and fetches it again in the background on each visit, as its `no-cache` says.
 */
function workerManifest(file: string): express.RequestHandler {
  return async (_req, res, next) => {
    const text = await readFile(file, 'utf8').catch((err: NodeJS.ErrnoException) => {
      if (err.code !== 'ENOENT') throw err;
      return undefined;
    });
    if (text === undefined) return next();
    const manifest = JSON.parse(text) as { hashTable?: Record<string, string> };
    delete manifest.hashTable?.['/index.html'];
    res.set('Cache-Control', 'no-cache').json(manifest);
  };
}
