import { dateText, type ExportContext } from './export-context';
import { PROGRAM_CAUTION } from './cautions';
import type { NotDrilled } from './drilling-program';
import { PECK_RATIO } from './drilling-program';
import { DXF_LAYER_SCHEME } from './dxf-layers';
import type { MachineSettings } from './machine-settings';
import { PINS_PER_SHELF } from './hardware-list';
import { PAPER, type PaperName } from './paper';

/** The names of the files at the top of a pack. */
export interface PackFileNames {
  cover: string;
  labels: string;
  readme: string;
  schedule: string;
  hardware: string;
  manifest: string;
}

/** What the README says of the drilling programs: the conventions they follow and, per panel, the holes they leave out. */
export interface ReadmePrograms {
  machine: MachineSettings;
  notDrilled: { panel: { id: string; name: string }; holes: NotDrilled[] }[];
}

/** The README's section on the drilling programs: how they are laid out, and every hole they leave out. */
function programsSection(programs: ReadmePrograms): string[] {
  const { machine } = programs;
  const leftOut = programs.notDrilled.filter((p) => p.holes.length > 0);
  return [
    'DRILLING PROGRAMS (G-CODE)',
    'Beside each DXF: <panel>.face-a.nc, <panel>.face-b.nc and <panel>.edge-x0.nc ... (edge-x1, edge-y0, edge-y1), one program per face and',
    'edge that has holes, in the words of ISO 6983 / RS-274: millimetres (G21), absolute (G90), the canned cycle G81, or G83 pecking',
    `where a hole is deeper than ${PECK_RATIO} times its diameter, G80 to cancel; holes grouped by tool, each group in nearest-neighbour order.`,
    'Each header says how the panel lies (a face up as on its drilling map; an edge up with the panel clamped on edge, face A toward',
    'the front, for a machine that drills that way or a horizontal head its maker says how to program), the zero point, Z zero,',
    'the heights, the tool table and the holes it leaves out.',
    `Machine settings: zero at the ${machine.origin} corner of the side up; Z0 ${machine.zZero === 'top' ? 'on the side up' : 'on the table'}; R plane ${machine.retract} mm and clearance ${machine.clearance} mm above the side up;`,
    `  through holes ${machine.breakthrough === null ? 'NOT drilled (no spoilboard allowance set)' : `the board's thickness and ${machine.breakthrough} mm into the spoilboard`};`,
    `  tools: ${machine.tools.map((t) => `T${t.tool} ${t.diameter} mm ${t.through ? 'through' : 'blind'}`).join(', ') || 'none'}.`,
    ...(leftOut.length === 0
      ? ['Every hole of every panel is in a program.']
      : [
          `HOLES NO PROGRAM DRILLS (${leftOut.reduce((sum, p) => sum + p.holes.length, 0)}): drill them from the templates, or add the tool or allowance in the machine settings.`,
          ...leftOut.flatMap((p) => [`  ${p.panel.name} (${p.panel.id}):`, ...p.holes.map((h) => `    ${h.key}: ${h.why}`)]),
        ]),
    `CAUTION: ${PROGRAM_CAUTION}`,
    '',
  ];
}

/**
 * The pack's README sheet, plain text for any machine: what each file is, the order to use them in, how
 * holes are named across the files, and our DXF layer names field by field, so that a shop maps them to
 * its tools once in its own machine software; with `programs`, the drilling programs' conventions and the
 * holes they leave out. `errors` is how many errors the checks found.
 */
export function packReadme(ctx: ExportContext, paper: PaperName, files: PackFileNames, errors: number, programs?: ReadmePrograms): string {
  const layers = DXF_LAYER_SCHEME;
  const lines = [
    `${ctx.job.name}: bench pack of ${dateText(ctx.date)}, made by ${ctx.generator.name} ${ctx.generator.version}`,
    '',
    ...(errors > 0 ? [`THIS PACK CONTAINS ERRORS (${errors}): the cover sheet and ${files.manifest} list them; each panel they concern says "HAS ERRORS" in its title block. Do not drill what they concern until it is put right.`, ''] : []),
    'READ ME FIRST',
    `1. ${files.cover}: the order of work, what the pack holds carcass by carcass, the safety notes and the findings.`,
    `2. Print the template sheets (a PDF per panel, on ${PAPER[paper].name}) at actual size, 100 %, no "fit to page"; measure the 100 mm bars on every sheet.`,
    `3. ${files.labels}: a label per panel, naming the face up and, on a side, LEFT or RIGHT as seen from the front.`,
    `4. ${files.hardware}: what to fetch from stores, per carcass; shelf pins ${PINS_PER_SHELF} per adjustable shelf, with the holes drilled for each fitting apart.`,
    `5. ${files.schedule}: every hole of every panel once, by its key, x from the reference edge and y from the lower edge (mm).`,
    '',
    'FILES',
    'A folder per carcass (and "no carcass") holds, per panel:',
    '  <panel> face A.svg, <panel> face B.svg  drilling maps at full size (face B only when it has holes of its own)',
    '  <panel>.dxf                             the holes for a machine, millimetres, face A as it lies face up',
    `  <panel> templates ${PAPER[paper].name}.pdf          an information sheet, then the panel tiled onto pages at 1:1`,
    ...(programs ? ['  <panel>.face-a.nc and others            drilling programs (G-code), one per face and edge with holes: see below'] : []),
    `${files.manifest} lists every file with its size and SHA-256, the findings and the DXF layer scheme.`,
    '',
    ...(programs ? programsSection(programs) : []),
    'ONE HOLE, ONE KEY',
    'A hole needed by two fittings (a plate screw in a line-bored system hole) is drilled once and listed once.',
    'Its key is the same in every file: the SVG maps (data-hole), the hole schedule (column "hole"), and by its',
    'position, diameter, depth and face in the DXF and the template sheets. Face hole keys: <face>:<x>:<y>:<diameter>;',
    'edge hole keys: <edge>:<along the edge>:<from face A>:<diameter>.',
    '',
    'DXF LAYERS',
    `Hole layers are named ${layers.pattern}:`,
    ...Object.entries(layers.fields).map(([field, meaning]) => `  ${field}: ${meaning}`),
    `Examples: ${layers.examples.join(', ')}.`,
    'Other layers:',
    ...Object.entries(layers.other).map(([name, meaning]) => `  ${name}: ${meaning}`),
    '',
    "Cautions: the hardware maker's data, local building codes and licensed professionals decide; the cover sheet lists the cautions that apply.",
  ];
  return lines.join('\r\n') + '\r\n';
}
