import * as z from 'zod';
import { text } from './well-formed-text';

/**
 * The job document, format `borewright.job/1` (design.md §3): the single definition of a job that the
 * CLI reads, import and export exchange, the database mirrors and the checks and exports take.
 * Lengths in millimetres, masses in kilograms, density in kg/m³, modulus in N/mm².
 */
export const JOB_FORMAT = 'borewright.job/1' as const;

/** Largest panel edge we accept: longer than any sheet good (2800 × 2070, 3050 × 1250 are common). */
export const MAX_PANEL_LENGTH = 6000;
/** Thickest board we accept; thicker stock is not drilled on the 32 mm system. */
export const MAX_THICKNESS = 100;
/** Most panels one job may hold. */
export const MAX_JOB_PANELS = 5000;

const id = z
  .string()
  .trim()
  .min(1, 'must not be empty')
  .max(64, 'must be at most 64 characters')
  .regex(/^[A-Za-z0-9][A-Za-z0-9._:-]*$/, 'may hold only letters, digits and . _ : - and must start with a letter or digit');

/** A name shown to people: any text but control characters, trimmed, 1 to 200 characters. */
export const displayName = text
  .trim()
  .min(1, 'must not be empty')
  .max(200, 'must be at most 200 characters')
  .regex(/^[^\u0000-\u001f\u007f]*$/, 'must not contain control characters');

const length = (max: number) =>
  z.number().finite('must be a finite number').positive('must be greater than 0').max(max, `must be at most ${max} mm`);
const coordinate = z.number().finite('must be a finite number').min(-MAX_PANEL_LENGTH).max(MAX_PANEL_LENGTH);

export const face = z.enum(['A', 'B']);
export const rotation = z.union([z.literal(0), z.literal(90), z.literal(180), z.literal(270)]);
export const edge = z.enum(['x0', 'x1', 'y0', 'y1']);
export const panelRole = z.enum([
  'side',
  'top',
  'bottom',
  'shelf',
  'back',
  'door',
  'flap',
  'drawer-front',
  'kickboard',
  'loose',
]);
export const panelStatus = z.enum(['planned', 'drilled', 'checked']);

export const systemSettings = z.object({
  pitch: length(100).default(32),
  setback: length(500).default(37),
  holeDiameter: length(20).default(5),
  holeDepth: length(50).default(13),
});

/** Shop limits; defaults from trade-reference.md §7 (common practice) and §5 (AWS L/144). */
export const shopLimits = z.object({
  minWeb: z.number().finite().min(0).max(50).default(3),
  minEdge: z.number().finite().min(0).max(50).default(3),
  minFloor: z.number().finite().min(0).max(50).default(3),
  /** Shelf deflection limit as a span ratio: 144 means L/144. */
  sagRatio: z.number().finite().min(50).max(1000).default(144),
});

export const material = z.object({
  id,
  name: displayName,
  thickness: length(MAX_THICKNESS),
  /** kg/m³ */
  density: z.number().finite().positive('must be greater than 0').max(3000, 'must be at most 3000 kg/m³'),
  /** Modulus of elasticity in bending, N/mm² */
  modulus: z.number().finite().positive('must be greater than 0').max(50_000, 'must be at most 50000 N/mm²'),
});

export const carcass = z.object({
  id,
  name: displayName,
  width: length(MAX_PANEL_LENGTH),
  height: length(MAX_PANEL_LENGTH),
  depth: length(MAX_PANEL_LENGTH),
  material: id,
  mounting: z.enum(['floor', 'wall']).default('floor'),
  /**
   * The description the carcass planner made this carcass from, as the planner reads it (without the
   * job's materials, system and limits), so that it can be planned again; absent for a carcass drawn by hand.
   */
  plannedFrom: z.record(text.max(64), z.unknown()).optional(),
});

export const placement = z.object({
  id,
  fitting: id,
  x: coordinate,
  y: coordinate,
  face,
  rotation: rotation.default(0),
  mirrored: z.boolean().optional(),
  /** Fitting parameters, such as a hinge's cup-boring distance `boringDistance`. */
  params: z.record(text.max(64), z.number().finite()).optional(),
});

export const faceBore = z.object({
  id,
  x: coordinate,
  y: coordinate,
  face,
  diameter: length(100),
  depth: length(MAX_PANEL_LENGTH),
});

export const edgeBore = z.object({
  id,
  edge,
  /** Position along the edge, in the panel's frame (x for y0/y1, y for x0/x1). */
  at: coordinate,
  /** Distance of the bore's axis from face A. */
  z: z.number().finite().min(0).max(MAX_THICKNESS),
  diameter: length(100),
  depth: length(MAX_PANEL_LENGTH),
});

/**
 * Face bores first: a union tries its branches in order and stops at the first that matches, and most
 * bores of a job are face bores (line boring, fittings), so most are validated once, not twice.
 */
export const bore = z.union([faceBore, edgeBore]);

export const hang = z.object({
  /** The panels (usually sides) the door or flap hangs on. */
  on: z.array(id).min(1).max(4),
  /** The door's y = 0 measured in the side's frame: a cup at door height c meets a plate at c + dy. */
  dy: coordinate,
});

export const panel = z.object({
  id,
  name: displayName,
  role: panelRole,
  carcass: id.optional(),
  width: length(MAX_PANEL_LENGTH),
  height: length(MAX_PANEL_LENGTH),
  thickness: length(MAX_THICKNESS),
  material: id,
  status: panelStatus.default('planned'),
  hang: hang.optional(),
  /** Mass of the handle on a door or flap, kg (a bar handle about 0.1 kg per 100 mm, common practice). */
  handleMass: z.number().finite().min(0).max(20).optional(),
  placements: z.array(placement).max(5000).default([]),
  bores: z.array(bore).max(20000).default([]),
});

const jobShape = z.object({
  format: z.literal(JOB_FORMAT),
  name: displayName,
  client: text.trim().max(200).optional(),
  notes: text.max(10_000).optional(),
  system: systemSettings.default({ pitch: 32, setback: 37, holeDiameter: 5, holeDepth: 13 }),
  limits: shopLimits.default({ minWeb: 3, minEdge: 3, minFloor: 3, sagRatio: 144 }),
  materials: z.array(material).max(200),
  carcasses: z.array(carcass).max(1000).default([]),
  panels: z.array(panel).max(MAX_JOB_PANELS).default([]),
});

/** Every id unique in its list, every reference pointing at something that exists. */
export const jobDocument = jobShape.superRefine((job, ctx) => {
  const unique = (items: { id: string }[], path: string) => {
    const seen = new Set<string>();
    items.forEach((item, i) => {
      if (seen.has(item.id)) ctx.addIssue({ code: 'custom', path: [path, i, 'id'], message: `duplicate id "${item.id}"` });
      seen.add(item.id);
    });
    return seen;
  };
  const materials = unique(job.materials, 'materials');
  const carcasses = unique(job.carcasses, 'carcasses');
  const panels = unique(job.panels, 'panels');
  job.carcasses.forEach((c, i) => {
    if (!materials.has(c.material))
      ctx.addIssue({ code: 'custom', path: ['carcasses', i, 'material'], message: `no material with id "${c.material}"` });
  });
  job.panels.forEach((p, i) => {
    if (!materials.has(p.material))
      ctx.addIssue({ code: 'custom', path: ['panels', i, 'material'], message: `no material with id "${p.material}"` });
    if (p.carcass !== undefined && !carcasses.has(p.carcass))
      ctx.addIssue({ code: 'custom', path: ['panels', i, 'carcass'], message: `no carcass with id "${p.carcass}"` });
    p.hang?.on.forEach((target, j) => {
      if (!panels.has(target) || target === p.id)
        ctx.addIssue({ code: 'custom', path: ['panels', i, 'hang', 'on', j], message: `no other panel with id "${target}"` });
    });
    const placementIds = new Set<string>();
    p.placements.forEach((pl, j) => {
      if (placementIds.has(pl.id))
        ctx.addIssue({ code: 'custom', path: ['panels', i, 'placements', j, 'id'], message: `duplicate id "${pl.id}"` });
      placementIds.add(pl.id);
    });
    const boreIds = new Set<string>();
    p.bores.forEach((b, j) => {
      if (boreIds.has(b.id))
        ctx.addIssue({ code: 'custom', path: ['panels', i, 'bores', j, 'id'], message: `duplicate id "${b.id}"` });
      boreIds.add(b.id);
    });
  });
});

export type JobDocument = z.output<typeof jobDocument>;
export type JobDocumentInput = z.input<typeof jobDocument>;
export type SystemSettings = z.output<typeof systemSettings>;
export type ShopLimits = z.output<typeof shopLimits>;
export type Material = z.output<typeof material>;
export type Carcass = z.output<typeof carcass>;
export type Panel = z.output<typeof panel>;
export type PanelRole = z.output<typeof panelRole>;
export type PanelStatus = z.output<typeof panelStatus>;
export type Placement = z.output<typeof placement>;
export type FaceBore = z.output<typeof faceBore>;
export type EdgeBore = z.output<typeof edgeBore>;
export type Bore = z.output<typeof bore>;
export type Face = z.output<typeof face>;
export type Edge = z.output<typeof edge>;
export type Rotation = z.output<typeof rotation>;

/** Tells an edge bore from a face bore. */
export function isEdgeBore(b: Bore): b is EdgeBore {
  return 'edge' in b;
}
