import { dateText, type ExportContext } from './export-context';
import { DXF_LAYER_SCHEME } from './dxf-layers';
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

/**
 * The pack's README sheet, plain text for any machine: what each file is, the order to use them in, how
 * holes are named across the files, and our DXF layer names field by field, so that a shop maps them to
 * its tools once in its own machine software. `errors` is how many errors the checks found.
 */
export function packReadme(ctx: ExportContext, paper: PaperName, files: PackFileNames, errors: number): string {
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
    `${files.manifest} lists every file with its size and SHA-256, the findings and the DXF layer scheme.`,
    '',
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
