import * as z from 'zod';

/**
 * Where a drilling program's zero point (X0 Y0) lies: a corner of the face that lies up, as the operator
 * sees the panel from the front of the machine. The panel always lies as the program's header says (face A
 * up as on its drilling map: the reference edge on the left, or on the right where the document's frame is
 * the face's mirror, map-view.ts `referenceAt`); the corner only moves the zero.
 */
export const originCorner = z.enum(['front-left', 'front-right', 'back-left', 'back-right']);
export type OriginCorner = z.output<typeof originCorner>;

/** Where Z = 0 is: on the face that lies up, or on the machine's table (the face up is then at the panel's height). */
export const zZero = z.enum(['top', 'table']);
export type ZZero = z.output<typeof zZero>;

/**
 * One tool of the machine: a bit of one diameter, either for blind holes (a flat-bottomed bit) or for
 * through holes (a point that breaks out cleanly), with its number in the machine's tool changer or head,
 * its plunge feed and its spindle speed.
 */
export const machineTool = z.object({
  diameter: z.number().positive().max(100),
  through: z.boolean(),
  tool: z.number().int().min(1).max(999),
  /** Plunge feed, mm per minute. */
  feed: z.number().positive().max(20_000),
  /** Spindle speed, revolutions per minute. */
  speed: z.number().int().positive().max(30_000),
});
export type MachineTool = z.output<typeof machineTool>;

/** Two tools are for the same holes when their diameters agree within 0.01 mm and both are blind or both through. */
export const sameToolUse = (a: { diameter: number; through: boolean }, b: { diameter: number; through: boolean }) => a.through === b.through && Math.abs(a.diameter - b.diameter) <= 0.01;

/**
 * A shop's machine conventions, set once: the drilling programs follow them. Heights are above the face
 * that lies up: the R plane where each feed starts and ends, the clearance height for every move across
 * the panel. `breakthrough` is how far a through hole goes past the far face into a spoilboard; while the
 * shop has not set it (null) no program drills a through hole, and each says which it left out.
 */
export const machineSettings = z
  .object({
    origin: originCorner,
    zZero,
    retract: z.number().min(1).max(100),
    clearance: z.number().min(1).max(300),
    breakthrough: z.number().min(0).max(5).nullable(),
    tools: z.array(machineTool).max(64),
  })
  .superRefine((settings, ctx) => {
    if (settings.clearance < settings.retract) ctx.addIssue({ code: 'custom', path: ['clearance'], message: 'The clearance height must be at least the R plane.' });
    settings.tools.forEach((tool, i) => {
      const earlier = settings.tools.slice(0, i);
      if (earlier.some((t) => sameToolUse(t, tool))) ctx.addIssue({ code: 'custom', path: ['tools', i, 'diameter'], message: `A second tool for ${tool.through ? 'through' : 'blind'} holes of ${tool.diameter} mm: keep one.` });
      if (earlier.some((t) => t.tool === tool.tool)) ctx.addIssue({ code: 'custom', path: ['tools', i, 'tool'], message: `Tool number ${tool.tool} is given twice.` });
    });
  });
export type MachineSettings = z.output<typeof machineSettings>;

const blind = (diameter: number, tool: number, speed: number, feed: number): MachineTool => ({ diameter, through: false, tool, feed, speed });

/**
 * What a shop starts from: zero at the front-left corner of the side up (on face A of a left side, where
 * the reference edge meets the lower edge), Z = 0 on the face up, the R plane 5 mm and the clearance 25 mm above it, no spoilboard
 * allowance, and flat-bottomed bits of the diameters the 32 mm system uses most (5 mm system holes, 8 and
 * 10 mm dowels and sleeves, 15 mm cam housings, 35 mm hinge cups) with a 5 and an 8 mm through bit.
 * Speeds and feeds are modest starting points for boring bits in board (common practice, from memory):
 * the bit maker's figures and a trial on scrap decide.
 */
export const DEFAULT_MACHINE_SETTINGS: MachineSettings = {
  origin: 'front-left',
  zZero: 'top',
  retract: 5,
  clearance: 25,
  breakthrough: null,
  tools: [
    blind(5, 1, 4000, 1500),
    blind(8, 2, 4000, 1500),
    blind(10, 3, 4000, 1200),
    blind(15, 4, 3000, 1000),
    blind(35, 5, 2500, 800),
    { diameter: 5, through: true, tool: 6, feed: 1200, speed: 4000 },
    { diameter: 8, through: true, tool: 7, feed: 1200, speed: 4000 },
  ],
};
