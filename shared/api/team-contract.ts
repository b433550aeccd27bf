import * as z from 'zod';
import { displayName } from '../model/job-document';
import { dbId, password, role } from './contract';

/**
 * The team's part of the HTTP API (design.md §1, issue 7 part 5): members and their roles,
 * invitations by mail, deactivation, and password reset by mail. Shared by the server (which
 * validates what comes in) and the client (which validates answers).
 */

/** An e-mail address as the team's forms take it: trimmed and lowercased, as sign-in does. */
export const memberAddress = z.string().trim().toLowerCase().email('must be an e-mail address').max(254, 'must be at most 254 characters');

/** A member's name as shown in the toolbar, the team table, the activity log and mail headers: no control characters. */
export const memberName = displayName;

export const teamMember = z.object({
  id: z.number().int(),
  name: z.string(),
  email: z.string(),
  role,
  active: z.boolean(),
  createdAt: z.string(),
});
export type TeamMember = z.output<typeof teamMember>;

/** An invitation not yet accepted: still pending, or expired (the admin may send it again or withdraw it). */
export const pendingInvitation = z.object({
  id: z.number().int(),
  email: z.string(),
  role,
  createdAt: z.string(),
  expiresAt: z.string(),
  expired: z.boolean(),
  invitedBy: z.string().nullable(),
});
export type PendingInvitation = z.output<typeof pendingInvitation>;

export const teamAnswer = z.object({ members: z.array(teamMember), invitations: z.array(pendingInvitation) });
export type TeamAnswer = z.output<typeof teamAnswer>;

export const invitationBody = z.object({
  email: memberAddress,
  role,
  /** Only for the greeting of the mail; the invited person types their own name on accepting. */
  name: memberName.optional(),
});
export type InvitationBody = z.input<typeof invitationBody>;

export const invitationParams = z.object({ invitationId: dbId });
export const memberParams = z.object({ userId: dbId });

export const memberUpdateBody = z
  .object({ role: z.optional(role), active: z.boolean('must be true or false').optional() })
  .refine((b) => b.role !== undefined || b.active !== undefined, 'name a role or whether the member is active');
export type MemberUpdate = z.input<typeof memberUpdateBody>;

/** What an invitation link grants, shown on the accept page before the person chooses a password. */
export const invitationAnswer = z.object({ email: z.string(), role, expiresAt: z.string() });
export type InvitationAnswer = z.output<typeof invitationAnswer>;

export const acceptInvitationBody = z.object({ name: memberName, password });
export type AcceptInvitationBody = z.input<typeof acceptInvitationBody>;

/** Asking for a reset link; the answer is the same whether or not the address has an account. */
export const passwordResetRequestBody = z.object({ email: memberAddress });
export const passwordResetRequested = z.object({ message: z.string() });

/** What a reset link is for, shown on the reset page. */
export const passwordResetAnswer = z.object({ email: z.string(), expiresAt: z.string() });
export type PasswordResetAnswer = z.output<typeof passwordResetAnswer>;

export const passwordResetBody = z.object({ password });

/** A mailed link's token in a path; any text, as a malformed one is answered like an unknown one (404). */
export const linkParams = z.object({ token: z.string() });

/**
 * The shape of a mailed link's token: 32 random bytes in base64url. Anything else cannot be one of
 * ours and is answered as an unknown link, without a database lookup.
 */
export const mailTokenShape = /^[A-Za-z0-9_-]{43}$/;

/** Error codes of the mailed links, which the public pages turn into plain sentences. */
export const LINK_ERRORS = {
  unknown: 'link-unknown',
  expired: 'link-expired',
  used: 'link-used',
} as const;

/** What each role may do, in the words of design.md §1: for the invitation mail and the role choice on screen. */
export const ROLE_DUTIES: Record<z.output<typeof role>, string> = {
  admin: 'everything, plus the team, roles and shop settings',
  designer: 'create and edit jobs, carcasses, panels and placements; run checks; export and send packs',
  bench: 'read jobs, download and print packs and templates, mark panels drilled or checked',
  viewer: 'read jobs, drawings and cautions; nothing else',
};
