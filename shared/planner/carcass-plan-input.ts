import * as z from 'zod';
import { fittingId } from '../catalog/fitting';
import { DEFAULT_MATERIALS } from '../model/default-materials';
import { MAX_PANEL_LENGTH, carcass, displayName, material, shopLimits, systemSettings } from '../model/job-document';

/**
 * What the carcass planner takes: one box and how it opens, in millimetres and kilograms. Sizes are the
 * outside of the box (the sides' height, the width across both sides, the sides' depth).
 */
const length = (max: number) =>
  z.number().finite('must be a finite number').positive('must be greater than 0').max(max, `must be at most ${max} mm`);
const gap = z.number().finite('must be a finite number').min(0, 'must not be negative').max(20, 'must be at most 20 mm');
const handle = z.number().finite().min(0, 'must not be negative').max(20, 'must be at most 20 kg').default(0);
const materialId = carcass.shape.material;

const back = z.discriminatedUnion('type', [
  z.object({ type: z.literal('none') }),
  /** A back of the carcass board set between sides, top and bottom at the rear. */
  z.object({ type: z.literal('inset') }),
  /** A thin back slid into grooves of the sides, top and bottom. */
  z.object({
    type: z.literal('grooved'),
    material: materialId,
    /** The groove's distance from the back edge to the back panel's rear face. */
    setIn: z.number().finite().min(0).max(100),
    /** How deep the groove goes into the sides, top and bottom. */
    grooveDepth: z.number().finite().positive('must be greater than 0').max(20),
  }),
]);

const doors = z.object({
  type: z.literal('doors'),
  count: z.union([z.literal(1), z.literal(2)]),
  overlay: z.enum(['full', 'half', 'inset']),
  /** The gap between neighbouring fronts; half of it at each outer edge. */
  reveal: gap,
  /** Which side a single door hangs on, seen from the front. */
  hingeSide: z.enum(['left', 'right']).default('left'),
  /** A hinge of the catalog; by default the first of the wanted overlay. */
  hinge: fittingId.optional(),
  material: materialId.optional(),
  handleMass: handle,
});

const flap = z.object({
  type: z.literal('flap'),
  reveal: gap,
  /** One lift mechanism on the left side, or one on each side sharing the load. */
  mechanisms: z.union([z.literal(1), z.literal(2)]).default(2),
  hinge: fittingId.optional(),
  material: materialId.optional(),
  handleMass: handle,
});

const drawers = z.object({
  type: z.literal('drawers'),
  count: z.number().int('must be a whole number').min(1, 'must be at least 1').max(8, 'must be at most 8'),
  reveal: gap,
  material: materialId.optional(),
});

const sectionFront = z.discriminatedUnion('type', [z.object({ type: z.literal('none') }), doors, flap, drawers]);

/**
 * A carcass divided by fixed shelves into sections, each with its own front: doors below a lift-up flap,
 * drawers under doors. From the bottom up; each section's height runs from the carcass's lower edge or the
 * centre of the dividing shelf below it to the centre of the one above it, and the last takes what is left.
 * A flap hangs from the carcass's top, so it can only be the top section's front.
 */
const sections = z.object({
  type: z.literal('sections'),
  sections: z
    .array(z.object({ height: length(MAX_PANEL_LENGTH).optional(), front: sectionFront }))
    .min(2, 'must have at least 2 sections')
    .max(4, 'must have at most 4 sections'),
});

const shelves = z.discriminatedUnion('type', [
  z.object({ type: z.literal('none') }),
  z.object({ type: z.literal('fixed'), count: z.number().int('must be a whole number').min(1).max(10) }),
  z.object({
    type: z.literal('adjustable'),
    count: z.number().int('must be a whole number').min(1).max(10),
    /** The range of side heights that get shelf-pin holes; by default the whole inside. */
    from: z.number().finite().min(0).optional(),
    to: z.number().finite().min(0).optional(),
    /** Play at each end so that the shelf drops in between the sides. */
    play: z.number().finite().min(0).max(5),
  }),
]);

const mounting = z.discriminatedUnion('type', [
  z.object({ type: z.literal('wall') }),
  z.object({ type: z.literal('kickboard'), height: length(300), setBack: z.number().finite().min(0).max(200) }),
]);

export const carcassPlanInput = z.object({
  id: carcass.shape.id.default('carcass'),
  name: displayName.default('Carcass'),
  width: length(MAX_PANEL_LENGTH),
  height: length(MAX_PANEL_LENGTH),
  depth: length(MAX_PANEL_LENGTH),
  material: materialId,
  /** The board thickness asked for; it must be the one the material comes in. */
  thickness: length(100).optional(),
  materials: z.array(material).min(1).max(200).default([...DEFAULT_MATERIALS]),
  system: systemSettings.default({ pitch: 32, setback: 37, holeDiameter: 5, holeDepth: 13 }),
  limits: shopLimits.default({ minWeb: 3, minEdge: 3, minFloor: 3, sagRatio: 144 }),
  back,
  construction: z.enum(['dowels', 'cams', 'screws']),
  fronts: z.discriminatedUnion('type', [z.object({ type: z.literal('none') }), doors, flap, drawers, sections]),
  shelves,
  mounting,
});

export type CarcassPlanInput = z.output<typeof carcassPlanInput>;
export type CarcassPlanInputData = z.input<typeof carcassPlanInput>;
export type DoorsInput = z.output<typeof doors>;
export type FlapInput = z.output<typeof flap>;
export type DrawersInput = z.output<typeof drawers>;
export type SectionsInput = z.output<typeof sections>;
export type SectionFrontInput = z.output<typeof sectionFront>;
export type ShelvesInput = CarcassPlanInput['shelves'];
