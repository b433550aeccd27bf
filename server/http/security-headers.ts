import { randomBytes } from 'node:crypto';
import type { RequestHandler, Response } from 'express';
import type { Config } from '../config';

/**
 * What index.html carries where each answer's nonce goes: Angular reads `ngCspNonce` on the root
 * element and puts it on the <style> elements it adds for components (client-app.ts fills it in).
 */
export const CSP_NONCE_PLACEHOLDER = 'CSP_NONCE';

/**
 * The content security policy of the app: scripts, styles, fonts and requests only from our own origin,
 * no inline script at all and inline styles only with the page's nonce (so no 'unsafe-inline'; an answer
 * that is no page has no nonce and allows no inline style), and no framing by anyone (frame-ancestors,
 * which X-Frame-Options says again for older browsers). The offline service worker and the web app
 * manifest come from our origin too, said outright rather than left to default-src.
 */
export function contentSecurityPolicy(nonce?: string): string {
  return [
    "default-src 'self'",
    "script-src 'self'",
    nonce ? `style-src 'self' 'nonce-${nonce}'` : "style-src 'self'",
    "img-src 'self' data: blob:",
    "font-src 'self'",
    "connect-src 'self'",
    "worker-src 'self'",
    "manifest-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join('; ');
}

/** The policy of every answer but a page: the same string each time. */
const POLICY_WITHOUT_NONCE = contentSecurityPolicy();

/**
 * Gives a page (index.html, client-app.ts) a fresh nonce for its inline styles, in its policy header too.
 * Only pages need one, so the API's answers make no random bytes and no policy of their own.
 */
export function pageStyleNonce(res: Response): string {
  const nonce = randomBytes(16).toString('base64');
  res.set('Content-Security-Policy', contentSecurityPolicy(nonce));
  return nonce;
}

/** A year, the usual HSTS lifetime; sub-domains are left alone, as they may be other services of the shop. */
const HSTS = 'max-age=31536000';

/**
 * Headers every answer carries: the content security policy (a page's with its nonce, `pageStyleNonce`),
 * no MIME sniffing, no framing, no full URLs leaked to other sites, and in production, which runs behind
 * TLS, Strict-Transport-Security.
 */
export function securityHeaders(config: Pick<Config, 'env'>): RequestHandler {
  return (_req, res, next) => {
    res.set({
      'Content-Security-Policy': POLICY_WITHOUT_NONCE,
      'X-Content-Type-Options': 'nosniff',
      'X-Frame-Options': 'DENY',
      'Referrer-Policy': 'same-origin',
      'Cross-Origin-Opener-Policy': 'same-origin',
      ...(config.env === 'production' && { 'Strict-Transport-Security': HSTS }),
    });
    next();
  };
}
