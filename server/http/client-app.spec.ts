import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../testing/test-app';

describe('the web app and the API side by side', () => {
  let built: TestApp;
  let unbuilt: TestApp;
  let dir: string;
  beforeAll(async () => {
    dir = mkdtempSync(path.join(tmpdir(), 'borewright-client-'));
    mkdirSync(path.join(dir, 'assets'));
    writeFileSync(path.join(dir, 'index.html'), '<!doctype html><title>Borewright</title><bw-root ngCspNonce="CSP_NONCE"></bw-root>');
    writeFileSync(path.join(dir, 'assets', 'app.js'), 'console.log(1)');
    const hashTable = { '/index.html': 'a'.repeat(40), '/assets/app.js': 'b'.repeat(40) };
    writeFileSync(path.join(dir, 'ngsw.json'), JSON.stringify({ configVersion: 1, index: '/index.html', hashTable }));
    [built, unbuilt] = await Promise.all([createTestApp({ clientDir: dir }), createTestApp({ clientDir: path.join(dir, 'missing') })]);
  });
  afterAll(async () => {
    await Promise.all([built.close(), unbuilt.close()]);
    rmSync(dir, { recursive: true, force: true });
  });

  it('serves files, and index.html for any other page so deep links work', async () => {
    expect((await request(built.app).get('/assets/app.js').expect(200)).text).toBe('console.log(1)');
    for (const page of ['/', '/jobs/3', '/jobs/3/panels/12?x=1']) {
      const res = await request(built.app).get(page).expect(200);
      expect(res.text).toContain('<title>Borewright</title>');
      expect(res.headers['cache-control']).toBe('no-cache');
    }
  });

  it('keeps /api for JSON: an unknown API path is a JSON 404, never the page', async () => {
    const res = await request(built.app).get('/api/jobs/3/nothing').expect(404);
    expect(res.headers['content-type']).toMatch(/^application\/json/);
    expect(res.body.error.code).toBe('not-found');
    expect(res.headers['cache-control']).toBe('no-store');
  });

  // index.html carries a fresh nonce in every answer, so its built hash can never match what the worker
  // fetches; the worker refuses a whole version on one mismatch (ngsw-worker.js cacheBustedFetchFromNetwork).
  it('gives the offline worker its manifest without a hash for index.html, and every other hash as built', async () => {
    const res = await request(built.app).get('/ngsw.json?ngsw-cache-bust=0.5').expect(200);
    expect(res.body).toMatchObject({ configVersion: 1, index: '/index.html' });
    expect(res.body.hashTable).toEqual({ '/assets/app.js': 'b'.repeat(40) });
    expect(res.headers['cache-control']).toBe('no-cache');
    await request(unbuilt.app).get('/ngsw.json').expect(503);
  });

  it('says plainly when the app is not built', async () => {
    const res = await request(unbuilt.app).get('/jobs').expect(503);
    expect(res.text).toContain('npm run build');
    await request(unbuilt.app).get('/api/health').expect(200, { ok: true });
  });

  it('sends the security headers everywhere', async () => {
    for (const url of ['/', '/api/health']) {
      const res = await request(built.app).get(url);
      expect(res.headers).toMatchObject({ 'x-content-type-options': 'nosniff', 'x-frame-options': 'DENY' });
      expect(res.headers['content-security-policy']).toContain("frame-ancestors 'none'");
      expect(res.headers).not.toHaveProperty('x-powered-by');
    }
  });

  it('gives each page a fresh nonce, the same in the policy and on the app’s root element', async () => {
    const nonces = [];
    for (const page of ['/', '/jobs/3', '/index.html']) {
      const res = await request(built.app).get(page).expect(200);
      const nonce = /'nonce-([A-Za-z0-9+/=]+)'/.exec(res.headers['content-security-policy'])![1];
      expect(res.text).toContain(`<bw-root ngCspNonce="${nonce}">`);
      expect(res.text).not.toContain('CSP_NONCE');
      nonces.push(nonce);
    }
    expect(new Set(nonces).size).toBe(3);
  });
});
