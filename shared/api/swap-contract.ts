import * as z from 'zod';
import { isWellFormedText, LONE_SURROGATE_MESSAGE, text } from '../model/well-formed-text';
import { swapReport } from '../swap/swap-report';
import { paperQuery } from './pack-contract';

/**
 * The swap check's part of the HTTP API: the report, the retrofit pack and applying the swap. Shared by
 * the server (which validates what comes in) and the client (which validates answers).
 */

/** A fitting id as the job or the catalog names it; whether the catalog knows it is the swap check's to say. */
const fittingName = z.string('is required').refine(isWellFormedText, LONE_SURROGATE_MESSAGE).trim().min(1, 'must name a fitting').max(64, 'must be at most 64 characters');

/** `?from=&to=`: the fitting used in the job and its replacement. */
export const swapQuery = z.object({ from: fittingName, to: fittingName });

/** `?from=&to=&paper=` for the retrofit pack: its template sheets are tiled like the bench pack's. */
export const retrofitQuery = swapQuery.extend({ paper: paperQuery.shape.paper });

/**
 * POST /api/jobs/:jobId/swap. `versions` holds the version of each panel as the client saw it in the
 * report, by panel id: a panel changed since answers 409, so a swap is never applied to a plan nobody saw.
 */
export const swapApplyBody = swapQuery.extend({
  versions: z.record(text.max(64), z.number().int().min(1)).optional(),
});
export type SwapApplyBody = z.input<typeof swapApplyBody>;

/** GET /api/jobs/:jobId/swap answers the report and, by panel id, the versions it was made from. */
export const swapAnswer = z.object({ report: swapReport, versions: z.record(z.string(), z.number().int()) });
export type SwapAnswer = z.output<typeof swapAnswer>;

/** What applying a swap changed. */
export const swapApplied = z.object({
  from: z.string(),
  to: z.string(),
  /** Panels whose placements now name the new fitting; each got a new version. */
  panels: z.number().int(),
  placements: z.number().int(),
  /** Panels drilled already that need new holes or a new board: marked planned again, so the bench finds them. */
  backToPlanned: z.array(z.string()),
});
export type SwapApplied = z.output<typeof swapApplied>;
