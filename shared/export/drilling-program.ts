import { handText } from '../layout/side-hand';
import { PROGRAM_CAUTION } from './cautions';
import { nearestNeighbourTour, tourLength, type TourPoint } from './drill-tour';
import { carcassName, faceText, materialName, type ExportContext } from './export-context';
import { sameToolUse, type MachineSettings, type MachineTool } from './machine-settings';
import type { PanelDrilling } from './panel-drilling';
import type { PanelHole } from './panel-holes';
import type { ProgramView } from './program-views';
import { lengthText, roundTo } from './units';

/**
 * A hole is peck drilled (G83, the bit backing out to clear chips every `Q` mm) when it is deeper than
 * three times its diameter; shallower holes are drilled in one feed (G81). The rule of thumb of twist
 * drilling (common practice, from memory); a 5 mm through hole in 18 mm board is pecked, a hinge cup is not.
 */
export const PECK_RATIO = 3;

/** A hole as a program drills it: where in the side's plane and how deep from the face up. */
export interface ProgramHole extends TourPoint {
  hole: PanelHole;
  depth: number;
}

/** The holes one tool drills to one depth, in the order drilled. */
export interface ToolGroup {
  tool: MachineTool;
  depth: number;
  /** Peck drilling with this step, mm; none for a single feed. */
  peck?: number;
  holes: ProgramHole[];
}

/** A hole of the side that its program leaves out, and why: it is named in the program and the pack. */
export interface NotDrilled {
  key: string;
  why: string;
}

/** A program worked out before it is written: its tool groups, the holes it leaves out, and its travel. */
export interface ProgramPlan {
  view: ProgramView;
  groups: ToolGroup[];
  notDrilled: NotDrilled[];
  /** Travel between holes from the zero point, mm: in the nearest-neighbour order, and in the hole list's order. */
  travel: { toured: number; listed: number };
}

const isThrough = (hole: PanelHole) => hole.kind === 'face' && hole.through;

/** Where the zero point lies in the side's plane. */
function zeroPoint(view: ProgramView, machine: MachineSettings): TourPoint {
  return { u: machine.origin.endsWith('right') ? view.length : 0, v: machine.origin.startsWith('back') ? view.across : 0 };
}

/** The tool that drills a hole, or why no program drills it: no tool of its diameter (blind or through), or a through hole with no spoilboard allowance set. */
export function holeTool(hole: PanelHole, machine: MachineSettings): { tool: MachineTool } | { why: string } {
  const through = isThrough(hole);
  const tool = machine.tools.find((t) => sameToolUse(t, { diameter: hole.diameter, through }));
  if (!tool) return { why: `no tool for ${through ? 'through' : 'blind'} holes of ${lengthText(hole.diameter)} mm in the machine settings` };
  if (through && machine.breakthrough === null) return { why: 'a through hole: no spoilboard allowance is set in the machine settings' };
  return { tool };
}

/**
 * Works out a program for one side: each hole's tool (the one of its diameter, blind or through), its depth
 * (a through hole: the board's thickness and the shop's spoilboard allowance), grouped by tool and depth in
 * the order of the tool numbers, each group in nearest-neighbour order from where the last one ended. A hole
 * with no tool, or a through hole while the shop has set no spoilboard allowance, is left out and named.
 */
export function planProgram(view: ProgramView, thickness: number, machine: MachineSettings): ProgramPlan {
  const notDrilled: NotDrilled[] = [];
  const groups = new Map<string, ToolGroup>();
  for (const hole of view.holes) {
    const found = holeTool(hole, machine);
    if ('why' in found) {
      notDrilled.push({ key: hole.key, why: found.why });
      continue;
    }
    const { tool } = found;
    const depth = roundTo(isThrough(hole) ? thickness + (machine.breakthrough ?? 0) : hole.depth, 0.001);
    const id = `${tool.tool}:${depth}`;
    let group = groups.get(id);
    if (!group) {
      group = { tool, depth, ...(depth > PECK_RATIO * hole.diameter ? { peck: hole.diameter } : {}), holes: [] };
      groups.set(id, group);
    }
    group.holes.push({ hole, depth, ...view.place(hole) });
  }
  const ordered = [...groups.values()].sort((a, b) => a.tool.tool - b.tool.tool || a.depth - b.depth);
  const start = zeroPoint(view, machine);
  let at = start;
  let toured = 0;
  let listed = 0;
  let listedAt = start;
  for (const group of ordered) {
    listed += tourLength(group.holes, listedAt);
    listedAt = group.holes[group.holes.length - 1];
    group.holes = nearestNeighbourTour(group.holes, at);
    toured += tourLength(group.holes, at);
    at = group.holes[group.holes.length - 1];
  }
  return { view, groups: ordered, notDrilled, travel: { toured, listed } };
}

/** A number as a word's value: always with a decimal point, three places (an `X10` can read as 0.010 mm on older controls). */
const n = (value: number) => {
  const text = roundTo(value, 0.001).toFixed(3);
  return text === '-0.000' ? '0.000' : text;
};

/** A comment: printable ASCII only, no parentheses inside, so that every control reads it as one comment. */
const comment = (text: string) =>
  `(${text
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .replace(/[^\x20-\x7e]/g, '?')
    .replace(/\(/g, '[')
    .replace(/\)/g, ']')})`;

const ORIGIN_WORDS: Record<MachineSettings['origin'], ['front' | 'back', 'left' | 'right']> = {
  'front-left': ['front', 'left'],
  'front-right': ['front', 'right'],
  'back-left': ['back', 'left'],
  'back-right': ['back', 'right'],
};

/**
 * A program's text in the words of ISO 6983 / RS-274 (published, from memory): millimetres (G21), absolute
 * (G90), the XY plane (G17), feed per minute (G94), each tool loaded (T… M6) and started (S… M3), its holes
 * by the canned cycle G81 (or G83 with a peck step Q) from the R plane to the hole's depth, returning to the
 * clearance height after each hole (G98), the cycle cancelled (G80) and the spindle stopped (M5) before the
 * next tool, and the end (M30). The header says how the panel lies, where the zero is, the heights, the
 * tools and the holes left out, and carries the caution.
 */
export function programText(ctx: ExportContext, drilling: PanelDrilling, plan: ProgramPlan, machine: MachineSettings, files: { self: string; others: string[] }): string {
  const { panel } = drilling;
  const { view } = plan;
  const surface = machine.zZero === 'top' ? 0 : view.height;
  const clearance = surface + machine.clearance;
  const r = surface + machine.retract;
  const [frontBack, leftRight] = ORIGIN_WORDS[machine.origin];
  const dx = leftRight === 'right' ? view.length : 0;
  const dy = frontBack === 'back' ? view.across : 0;
  const hand = handText(panel, drilling.hand);
  const drilled = plan.groups.reduce((sum, g) => sum + g.holes.length, 0);
  const upText = view.side === 'face-a' || view.side === 'face-b' ? `face ${faceText(panel.role, view.side === 'face-a' ? 'A' : 'B')}` : view.up;
  const header = [
    `${files.self}: drilling program of ${ctx.generator.name} ${ctx.generator.version}, ISO 6983 / RS-274 words, millimetres`,
    `${ctx.job.name} / ${carcassName(ctx, panel)} / ${panel.name} [${panel.id}]${hand ? ` / ${hand}` : ''}`,
    `Panel ${lengthText(panel.width)} x ${lengthText(panel.height)} x ${lengthText(panel.thickness)} mm, ${materialName(ctx, panel)}`,
    ...(drilling.errors > 0 ? [`THIS PANEL HAS ERRORS (${drilling.errors}): the checks found them; do not drill until they are put right`] : []),
    `Up: ${upText}${view.side.startsWith('edge') ? ', the panel clamped on edge with face A toward the front' : ''}`,
    `Lay the panel with ${view.left} at the left, ${view.right} at the right, ${view.front} at the front, ${view.back} at the back`,
    `Reference edge [x = 0 of the panel]: ${view.reference}`,
    `Zero X0 Y0: the ${frontBack}-${leftRight} corner of the side up, where ${view[leftRight]} meets ${view[frontBack]}; X to the right, Y to the back`,
    `Z0: ${machine.zZero === 'top' ? 'on the side up' : `on the machine table; the side up is at Z${n(surface)}`}`,
    `Heights: clearance Z${n(clearance)}, R plane Z${n(r)}; after each hole back to the clearance height [G98]`,
    `Cycles: G81, or G83 pecking by the bit's diameter where a hole is deeper than ${PECK_RATIO} x its diameter; G80 cancels`,
    machine.breakthrough === null ? 'Through holes: not drilled [no spoilboard allowance is set]' : `Through holes: the board's thickness and ${lengthText(machine.breakthrough)} mm into the spoilboard`,
    ...(files.others.length > 0 ? [`The panel's other programs: ${files.others.join(', ')}`] : []),
    `Holes: ${view.holes.length}, drilled here ${drilled}, left out ${plan.notDrilled.length}`,
    'Tools:',
    ...plan.groups.map(
      (g) => `  T${g.tool.tool} D${lengthText(g.tool.diameter)} ${g.tool.through ? 'through' : 'blind'}, ${g.tool.speed} rpm, feed ${g.tool.feed} mm/min: ${g.holes.length} holes ${lengthText(g.depth)} deep${g.peck ? `, pecked by ${lengthText(g.peck)}` : ''}`,
    ),
    ...(plan.notDrilled.length > 0 ? ['NOT DRILLED BY THIS PROGRAM:', ...plan.notDrilled.map((h) => `  ${h.key}: ${h.why}`)] : []),
    `CAUTION: ${PROGRAM_CAUTION}`,
  ];
  const lines = ['%', ...header.map(comment), 'G21 G90 G17 G94 G80 G98', `G0 Z${n(clearance)}`];
  for (const g of plan.groups) {
    const cycle = g.peck ? 'G83' : 'G81';
    const bottom = `Z${n(surface - g.depth)} R${n(r)}${g.peck ? ` Q${n(g.peck)}` : ''} F${n(g.tool.feed)}`;
    lines.push(comment(`T${g.tool.tool}: ${g.holes.length} holes D${lengthText(g.tool.diameter)}, ${lengthText(g.depth)} deep`), `T${g.tool.tool} M6`, `S${g.tool.speed} M3`, `G0 Z${n(clearance)}`);
    for (const h of g.holes) lines.push(`${cycle} X${n(h.u - dx)} Y${n(h.v - dy)} ${bottom}`);
    lines.push('G80', 'M5', `G0 Z${n(clearance)}`);
  }
  lines.push('M30', '%');
  return lines.join('\n') + '\n';
}
