import type { Request } from 'express';
import type { Config } from '../config';

/**
 * The address the request's browser used to reach the server. Express's `protocol` and `host` read a
 * proxy's X-Forwarded-Proto and X-Forwarded-Host only when TRUST_PROXY trusts that proxy.
 */
export const requestOrigin = (req: Request): string => `${req.protocol}://${req.host}`;

/**
 * Where the links in our mail point: PUBLIC_URL when it is set. Otherwise, for mail a signed-in member
 * sends (an invitation), the address their browser used to reach the server; for mail anyone may ask
 * for (a password reset), the server's own listening address, never the request's Host header, which
 * a stranger could set to their own site and so receive the link a member clicks.
 */
export function linkOrigin(config: Pick<Config, 'publicUrl' | 'host' | 'port'>, signedInRequest?: Request): string {
  if (config.publicUrl) return config.publicUrl;
  if (signedInRequest) return requestOrigin(signedInRequest);
  const host = config.host.includes(':') ? `[${config.host}]` : config.host;
  return `http://${host}:${config.port}`;
}
