import * as z from 'zod';
import { fittingPurpose } from '../catalog/fitting';
import { finding } from '../checks/finding';
import { edge, face, panelRole, panelStatus } from '../model/job-document';

/**
 * The swap check's report (design.md §2 "swap check"): what replacing one fitting by another does to the
 * panels of a job that use it. Plain data, defined once here so that the server sends, the client reads
 * and the command line prints the same thing.
 */

const purpose = z.union([fittingPurpose, z.literal('loose')]);

/** One hole, as the layout drills it (shared/layout's PanelBore), in the panel's frame seen on face A. */
export const swapBore = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('face'),
    id: z.string(),
    x: z.number(),
    y: z.number(),
    face,
    diameter: z.number(),
    depth: z.number(),
    through: z.boolean(),
    purpose,
    placement: z.string().optional(),
  }),
  z.object({
    kind: z.literal('edge'),
    id: z.string(),
    edge,
    at: z.number(),
    z: z.number(),
    diameter: z.number(),
    depth: z.number(),
    purpose,
    placement: z.string().optional(),
  }),
]);
export type SwapBore = z.output<typeof swapBore>;

/**
 * What a panel comes to: `fine` when the new fitting needs no hole the panel lacks; `to-drill` when it
 * needs only new holes that can be drilled; `to-remake` when a new hole would clash with an existing one,
 * or an old hole left unused shows on a visible face. The verdict is the geometry's: it says what a
 * drilled panel needs. A panel still planned simply gets the new plan (see `drilled`).
 */
export const swapVerdict = z.enum(['fine', 'to-drill', 'to-remake']);
export type SwapVerdict = z.output<typeof swapVerdict>;

/** An existing hole a new one would run into, by the checks' own rule and words. */
export const swapClashWith = z.object({
  bore: swapBore,
  /** True when the existing hole is one the old fitting leaves unused; false when something still uses it. */
  unused: z.boolean(),
  code: z.enum(['bores-overlap', 'faces-clash', 'edge-bore-clash']),
  message: z.string(),
});

export const panelSwap = z.object({
  panel: z.object({
    id: z.string(),
    name: z.string(),
    role: panelRole,
    carcass: z.string().optional(),
    width: z.number(),
    height: z.number(),
    thickness: z.number(),
    status: panelStatus,
  }),
  /** The placements of the old fitting on this panel, which the swap gives the new one. */
  placements: z.array(z.string()),
  verdict: swapVerdict,
  /** Whether the panel is drilled already (status drilled or checked): only then does the verdict call for work. */
  drilled: z.boolean(),
  /** Holes of the new fitting that are there already: same face or edge, centre within 0.2 mm, same diameter, deep enough. */
  reused: z.array(z.object({ bore: swapBore, uses: z.string() })),
  /** Holes of the new fitting still to drill that clash with nothing; `deepens` names a hole there already but too shallow. */
  new: z.array(z.object({ bore: swapBore, deepens: z.string().optional() })),
  /** Holes of the new fitting that cannot be drilled, because an existing hole is in the way. */
  clashing: z.array(z.object({ bore: swapBore, with: z.array(swapClashWith) })),
  /** Holes of the old fitting that nothing uses after the swap; `visible` when they show on a visible face. */
  unused: z.array(z.object({ bore: swapBore, visible: z.boolean() })),
  /** Every hole of the panel as planned before the swap, for drawings. */
  existing: z.array(swapBore),
});
export type PanelSwap = z.output<typeof panelSwap>;

export const fittingRef = z.object({ id: z.string(), name: z.string(), purpose: fittingPurpose });
export type FittingRef = z.output<typeof fittingRef>;

export const swapSummary = z.object({
  /** Panels that use the old fitting. */
  panels: z.number().int(),
  /** Placements of the old fitting. */
  placements: z.number().int(),
  /** Drilled panels by verdict: nothing to do, new holes to drill, to be made again. */
  fine: z.number().int(),
  toDrill: z.number().int(),
  toRemake: z.number().int(),
  /** Panels not drilled yet: they simply get the new plan. */
  notDrilled: z.number().int(),
  /** Holes over every affected panel. */
  reused: z.number().int(),
  new: z.number().int(),
  clashing: z.number().int(),
  unused: z.number().int(),
  unusedVisible: z.number().int(),
});
export type SwapSummary = z.output<typeof swapSummary>;

export const swapReport = z.object({
  from: fittingRef,
  to: fittingRef,
  summary: swapSummary,
  panels: z.array(panelSwap),
  /** What the checks find in the job after the swap that they did not find before, and how many findings went away. */
  findings: z.object({ added: z.array(finding), resolved: z.number().int() }),
  /** What else a cabinetmaker should know: overlay changes, plates left as they are. */
  notes: z.array(z.string()),
});
export type SwapReport = z.output<typeof swapReport>;

/** Why a swap cannot be checked: a fitting the catalog does not know, or a replacement of another kind. */
export interface SwapRefusal {
  ok: false;
  code: 'unknown-fitting' | 'different-kind' | 'same-fitting';
  /** Which of the two fittings the problem is with. */
  field: 'from' | 'to';
  message: string;
}

export type SwapResult = { ok: true; report: SwapReport } | SwapRefusal;
