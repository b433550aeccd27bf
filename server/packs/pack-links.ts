import { createHmac, timingSafeEqual } from 'node:crypto';
import type { PaperName } from '../../shared/export/paper';
import { AppError } from '../http/app-error';

/** What a pack link grants: one job's pack on one paper, until a time. */
export interface PackLink {
  /** The shop of the member who sent it: whoever opens the link is signed in to none. */
  shopId: number;
  jobId: number;
  paper: PaperName;
  /** Milliseconds since the epoch. */
  expiresAt: number;
}

/** How long a mailed link works: a week covers a job's time at the bench without leaving it open for good. */
export const PACK_LINK_DAYS = 7;

// A purpose of its own in the MAC, so that no other value signed with the session secret can pass as a link.
const PURPOSE = 'borewright pack link';

const mac = (secret: string, payload: string) => createHmac('sha256', secret).update(`${PURPOSE}\n${payload}`).digest();

/** The token of a link: the grant in base64url, a dot, and its HMAC-SHA256 under the session secret. */
export function signPackLink(secret: string, link: PackLink): string {
  const payload = Buffer.from(JSON.stringify([link.jobId, link.paper, link.expiresAt, link.shopId])).toString('base64url');
  return `${payload}.${mac(secret, payload).toString('base64url')}`;
}

const refused = () => new AppError(403, 'bad-link', 'This download link is not valid. Ask for the pack to be sent again.');

/** The grant of a token; 403 when it was not made by this server (or was changed), 410 once it has expired. */
export function verifyPackLink(secret: string, token: string, now: Date): PackLink {
  const [payload, signature, ...rest] = token.split('.');
  if (!payload || !signature || rest.length > 0) throw refused();
  const given = Buffer.from(signature, 'base64url');
  const expected = mac(secret, payload);
  if (given.length !== expected.length || !timingSafeEqual(given, expected)) throw refused();
  const [jobId, paper, expiresAt, shopId] = JSON.parse(Buffer.from(payload, 'base64url').toString('utf8')) as [number, PaperName, number, number | undefined];
  // A link signed before shops were kept in links names none; it is sent again rather than guessed.
  if (shopId === undefined) throw refused();
  if (now.getTime() > expiresAt) {
    throw new AppError(410, 'link-expired', `This download link expired on ${new Date(expiresAt).toISOString().slice(0, 10)}. Ask for the pack to be sent again.`);
  }
  return { shopId, jobId, paper, expiresAt };
}
