import * as z from 'zod';
import { displayName } from '../model/job-document';
import { password } from './contract';
import { memberAddress, memberName } from './team-contract';

/**
 * Creating a shop (SIGNUP=open): what the visitor types, the one answer every request gets, and what the
 * mailed link shows before it is confirmed. Shared by the server (which validates what comes in) and the
 * client (its form and the answers). A shop id is never part of a body: the shop is made by the link.
 */

export const signUpBody = z.object({ shopName: displayName, name: memberName, email: memberAddress, password });
export type SignUpBody = z.input<typeof signUpBody>;

/** The answer to every well-formed sign-up request, whether the address is new or already has an account. */
export const signUpRequested = z.object({ message: z.string() });

/** What a confirmation link will make, shown before it is followed. */
export const signUpLinkAnswer = z.object({ email: z.string(), shopName: z.string(), name: z.string(), expiresAt: z.string() });
export type SignUpLinkAnswer = z.output<typeof signUpLinkAnswer>;
