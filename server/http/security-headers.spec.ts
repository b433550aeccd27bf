import express from 'express';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { testConfig } from '../testing/test-app';
import { pageStyleNonce, securityHeaders } from './security-headers';

const appFor = (env: 'development' | 'production' | 'test') =>
  express()
    .use(securityHeaders(testConfig({ env })))
    .get('/', (_req, res) => res.send('ok'))
    .get('/page', (_req, res) => res.type('html').send(`<p nonce="${pageStyleNonce(res)}">`));

/** The policy as a map of directive to its sources. */
function directives(header: string): Map<string, string[]> {
  return new Map(header.split(';').map((d) => d.trim().split(/\s+/)).map(([name, ...sources]) => [name, sources]));
}

describe('security headers', () => {
  // CSP Level 3 (W3C Working Draft): 'unsafe-inline' would let an injected <script> or on* handler run,
  // frame-ancestors 'none' forbids every framing page (published).
  it('send a content security policy without unsafe-inline or eval, refusing every framing page', async () => {
    const res = await request(appFor('development')).get('/').expect(200);
    const policy = directives(res.headers['content-security-policy']);
    expect(policy.get('script-src')).toEqual(["'self'"]);
    expect(policy.get('default-src')).toEqual(["'self'"]);
    expect(policy.get('object-src')).toEqual(["'none'"]);
    expect(policy.get('frame-ancestors')).toEqual(["'none'"]);
    expect(policy.get('style-src')).toEqual(["'self'"]);
    expect(res.headers['content-security-policy']).not.toMatch(/unsafe-inline|unsafe-eval/);
  });

  it("allow a page's inline styles by the page's own nonce only, with the rest of the policy unchanged", async () => {
    const plain = directives((await request(appFor('development')).get('/').expect(200)).headers['content-security-policy']);
    const res = await request(appFor('development')).get('/page').expect(200);
    const policy = directives(res.headers['content-security-policy']);
    const nonce = /nonce="([^"]+)"/.exec(res.text)![1];
    expect(policy.get('style-src')).toEqual(["'self'", `'nonce-${nonce}'`]);
    expect(nonce).toMatch(/^[A-Za-z0-9+/]{22}==?$/);
    expect(new Map([...policy].filter(([name]) => name !== 'style-src'))).toEqual(new Map([...plain].filter(([name]) => name !== 'style-src')));
  });

  // CSP Level 3: worker-src governs service worker scripts, manifest-src the web app manifest (published).
  it('let the offline worker and the app manifest come from our origin only', async () => {
    const policy = directives((await request(appFor('production')).get('/')).headers['content-security-policy']);
    expect(policy.get('worker-src')).toEqual(["'self'"]);
    expect(policy.get('manifest-src')).toEqual(["'self'"]);
  });

  // RFC 6797 §6.1: the header is honoured only over HTTPS, which production runs behind (published).
  it('ask for HTTPS only in production, which runs behind TLS', async () => {
    expect((await request(appFor('production')).get('/')).headers['strict-transport-security']).toBe('max-age=31536000');
    expect((await request(appFor('development')).get('/')).headers).not.toHaveProperty('strict-transport-security');
    expect((await request(appFor('test')).get('/')).headers).not.toHaveProperty('strict-transport-security');
  });
});
