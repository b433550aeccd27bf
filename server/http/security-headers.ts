import type { RequestHandler } from 'express';

/** Headers every answer carries: no MIME sniffing, no framing by other sites, no full URLs leaked to them. */
export const securityHeaders: RequestHandler = (_req, res, next) => {
  res.set({
    'X-Content-Type-Options': 'nosniff',
    'X-Frame-Options': 'DENY',
    'Referrer-Policy': 'same-origin',
    'Cross-Origin-Opener-Policy': 'same-origin',
  });
  next();
};
