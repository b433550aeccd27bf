import type { Request } from 'express';

/**
 * Where the links we hand out point (mail, label QR codes): the address the user's browser used to reach
 * the server. Behind a proxy that TRUST_PROXY names, Express reads the scheme from X-Forwarded-Proto and
 * the host from X-Forwarded-Host (`req.host`); otherwise both come from the connection and Host header.
 */
export const requestOrigin = (req: Request): string => `${req.protocol}://${req.host}`;
