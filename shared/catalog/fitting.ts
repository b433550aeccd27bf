import * as z from 'zod';
import { text } from '../model/well-formed-text';
import { displayName, edge } from '../model/job-document';

/**
 * A fitting of the hardware catalog (design.md §4): generic, never a brand. Its bores and keep-outs are
 * drawn in the fitting's own frame: relative to its anchor, as placed on face A with no turn and no
 * mirror, x and y as in the panel frame (for a hinge, x away from the door's hinge edge).
 * Every object that carries numbers says where they come from in `source`.
 */

/** Stable kebab-case id: lower-case letters and digits in groups joined by "-". */
export const fittingId = z
  .string()
  .max(64, 'must be at most 64 characters')
  .regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, 'must be kebab-case: lower-case letters and digits joined by "-"');

const boreId = z
  .string()
  .max(32, 'must be at most 32 characters')
  .regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, 'must be kebab-case: lower-case letters and digits joined by "-"');

const source = text.trim().min(1, 'must say where the numbers come from');
const offset = z.number().finite('must be a finite number').min(-2000).max(2000);
const size = (max: number) =>
  z.number().finite('must be a finite number').positive('must be greater than 0').max(max, `must be at most ${max} mm`);

/** What a fitting is for: sets the colour of its bores and which family data it carries. */
export const fittingPurpose = z.enum([
  'construction',
  'hinge-cup',
  'mounting-plate',
  'shelf-pin',
  'lift-mechanism',
  'runner',
]);

/** A bore into a face. `system` takes the job's system hole depth; `through` the panel's thickness. */
export const fittingFaceBore = z.object({
  id: boreId,
  kind: z.literal('face'),
  x: offset,
  y: offset,
  diameter: size(100),
  depth: z.union([size(100), z.literal('system'), z.literal('through')], {
    error: 'must be a depth in mm, "system" or "through"',
  }),
  source,
});

/**
 * A bore into an edge: it opens on the edge named by `toward` (in the fitting's frame) and runs to its
 * inner end at (x, y), so its depth is the distance from that edge to the inner end. A cam's edge bore
 * thus always reaches the cam, and an edge-only fitting is anchored on the edge itself.
 * `z` is the axis's distance from the face the fitting is placed on, or `mid` for mid-thickness.
 */
export const fittingEdgeBore = z.object({
  id: boreId,
  kind: z.literal('edge'),
  x: offset,
  y: offset,
  toward: edge,
  z: z.union([z.literal('mid'), z.number().finite().min(0).max(100)], { error: 'must be "mid" or a distance in mm' }),
  diameter: size(100),
  source,
});

/** A fitting's bore: into a face or into an edge. */
export const fittingBore = z.discriminatedUnion('kind', [fittingFaceBore, fittingEdgeBore]);

/** The area on the face the fitting's body needs, as a rectangle from its lower-left corner. */
export const keepOut = z.object({ x: offset, y: offset, width: size(3000), height: size(3000), source });

const range = z
  .object({ min: z.number().finite().min(0), max: z.number().finite().min(0) })
  .refine((r) => r.min <= r.max, { message: 'min must not exceed max', path: ['max'] });

const common = {
  id: fittingId,
  name: displayName,
  onSystemRow: z.boolean(),
  bores: z.array(fittingBore).min(1, 'a fitting needs at least one bore').max(100),
  keepOuts: z.array(keepOut).max(20).default([]),
  /** Pairs of its bores the fitting is made to join (a cam and its bolt's edge bore): never a clash. */
  joins: z.array(z.tuple([boreId, boreId])).max(50).default([]),
};

/** A cup hinge's family data (design.md §4). */
export const hingeData = z.object({
  /** The bore that is the cup; its diameter and depth are the cup's. */
  cupBore: boreId,
  overlay: z.enum(['full', 'half', 'inset']),
  /** Hinge constant K in overlay = K + B − plate height, mm. */
  constant: z.number().finite().min(-50).max(50),
  /** Cup-boring distance B (door edge to cup rim) the hinge allows, mm. */
  boringDistance: range,
  openingAngle: z.number().finite().min(30).max(270),
  source,
});

/** A fitting: its purpose with the family data that goes with it, its bores, keep-outs and joins, checked for consistency. */
export const fitting = z
  .discriminatedUnion('purpose', [
    z.object({ ...common, purpose: z.literal('construction') }),
    z.object({ ...common, purpose: z.literal('shelf-pin') }),
    z.object({ ...common, purpose: z.literal('hinge-cup'), hinge: hingeData }),
    z.object({
      ...common,
      purpose: z.literal('mounting-plate'),
      plate: z.object({ height: z.number().finite().min(0).max(50), source }),
    }),
    z.object({
      ...common,
      purpose: z.literal('lift-mechanism'),
      lift: z.object({
        powerFactor: range,
        /** Makers print a range for each mechanism or for the pair on one flap (trade-reference §8a): the entry must say which. */
        rangeFor: z.enum(['mechanism', 'pair'], { error: 'must say what the power-factor range is for: "mechanism" (each) or "pair"' }),
        source,
      }),
    }),
    z.object({ ...common, purpose: z.literal('runner'), runner: z.object({ length: size(2000), source }) }),
  ])
  .superRefine((f, ctx) => {
    const ids = new Set<string>();
    f.bores.forEach((b, i) => {
      if (ids.has(b.id)) ctx.addIssue({ code: 'custom', path: ['bores', i, 'id'], message: `duplicate bore id "${b.id}"` });
      ids.add(b.id);
    });
    f.joins.forEach(([a, b], i) => {
      if (a === b) ctx.addIssue({ code: 'custom', path: ['joins', i], message: 'joins a bore to itself' });
      [a, b].forEach((id, j) => {
        if (!ids.has(id)) ctx.addIssue({ code: 'custom', path: ['joins', i, j], message: `no bore with id "${id}"` });
      });
    });
    if (f.onSystemRow && !f.bores.some((b) => b.kind === 'face'))
      ctx.addIssue({ code: 'custom', path: ['onSystemRow'], message: 'a fitting on a system row needs a face bore' });
    if (f.purpose === 'hinge-cup' && !f.bores.some((b) => b.kind === 'face' && b.id === f.hinge.cupBore))
      ctx.addIssue({ code: 'custom', path: ['hinge', 'cupBore'], message: `no face bore with id "${f.hinge.cupBore}"` });
  });

export type Fitting = z.output<typeof fitting>;
export type FittingPurpose = z.output<typeof fittingPurpose>;
export type FittingBore = z.output<typeof fittingBore>;
export type FittingFaceBore = z.output<typeof fittingFaceBore>;
export type FittingEdgeBore = z.output<typeof fittingEdgeBore>;
export type KeepOut = z.output<typeof keepOut>;

/** The fittings a job can use, by id. */
export type Catalog = ReadonlyMap<string, Fitting>;
