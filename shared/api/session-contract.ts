import * as z from 'zod/mini';
import { LENGTH_UNITS } from '../units/length-unit';
import { ROLES } from './roles';

/**
 * The answers the app reads at its start (who is signed in, an error answer), in zod's tree-shakable
 * `zod/mini` form: the first page loads them on demand (auth-store.ts, api-problem.ts) beside its first
 * request, and carries no zod itself. contract.ts re-exports them; zod's classic schemas take them as
 * parts like any other.
 */

export * from './roles';

export const role = z.enum(ROLES);

/** How a user reads and types lengths (shared/units/length-unit.ts). */
export const lengthUnit = z.enum(LENGTH_UNITS);

export const user = z.object({
  id: z.number().check(z.int()),
  email: z.string(),
  name: z.string(),
  role,
  /** How this user reads and types lengths; the data stays in mm. */
  units: lengthUnit,
});
export type User = z.output<typeof user>;

export const userAnswer = z.object({ user });
/** GET /api/auth/session: who is signed in, or null; and whether visitors may create a shop here (SIGNUP=open). */
export const sessionAnswer = z.object({ user: z.nullable(user), signUpOpen: z.optional(z.boolean()) });

/** Every error answer of the API has this shape. */
export const apiError = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    /** Field messages by path, for 400s. */
    fields: z.optional(z.record(z.string(), z.string())),
    /** Every problem of an uploaded document, one line each, led by its path. */
    details: z.optional(z.array(z.string())),
  }),
});
export type ApiError = z.output<typeof apiError>;
