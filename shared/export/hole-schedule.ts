import type { Panel } from '../model/job-document';
import { toCsv } from './csv';
import { carcassName, type ExportContext, exportUnit, fittingNameOf } from './export-context';
import { PURPOSE_STYLES } from './palette';
import type { PanelDrilling } from './panel-drilling';
import type { PanelHole } from './panel-holes';
import { formatLength } from '../units/format-length';
import { isInches } from '../units/length-unit';
import { roundTo } from './units';

const FIELDS = ['carcass', 'panel', 'panel name', 'hole', 'face or edge', 'x', 'y', 'z from face A', 'diameter', 'depth', 'through', 'fitting', 'purpose', 'bores'];
/** Added after the others, so a reader that takes the columns above by position or by name reads them as before. */
const INCH_FIELDS = ['x in inches', 'y in inches', 'z from face A in inches'];

const n = (value: number) => roundTo(value, 0.0001);

/** Where a bore enters the panel, in its frame: a face bore's centre, an edge bore's point on its edge. */
function entry(hole: PanelHole, panel: Panel): [number, number] {
  if (hole.kind === 'face') return [hole.x, hole.y];
  return { x0: [0, hole.at], x1: [panel.width, hole.at], y0: [hole.at, 0], y1: [hole.at, panel.height] }[hole.edge] as [number, number];
}

/**
 * The hole schedule as CSV: a row per hole of every panel (each drilled once, whoever needs it), in the
 * document's order, in the panel's frame seen from face A (mm), named by the key every file of the pack
 * gives it. An edge hole's x and y are where it enters its edge; z is its height from face A. `bores`
 * names the document's bores the hole drills. For someone who reads inches (`ctx.unit`), the position
 * follows again in inches (`12 3/8"`), the millimetre columns kept as they are.
 */
export function holeScheduleCsv(ctx: ExportContext, drilling: readonly PanelDrilling[]): string {
  const rows: (string | number)[][] = [];
  const unit = exportUnit(ctx);
  const inches = isInches(unit);
  for (const { panel, holes } of drilling) {
    const fittingName = fittingNameOf(ctx, panel);
    const carcass = carcassName(ctx, panel);
    for (const hole of holes) {
      const [x, y] = entry(hole, panel);
      rows.push([
        carcass,
        panel.id,
        panel.name,
        hole.key,
        hole.kind === 'face' ? hole.face : `edge ${hole.edge}`,
        n(x),
        n(y),
        hole.kind === 'edge' ? n(hole.z) : '',
        n(hole.diameter),
        n(hole.depth),
        hole.kind === 'face' && hole.through ? 'yes' : 'no',
        hole.placement === undefined ? '' : fittingName(hole.placement),
        PURPOSE_STYLES[hole.purpose].label,
        hole.bores.join(' '),
        ...(inches ? [formatLength(x, unit), formatLength(y, unit), hole.kind === 'edge' ? formatLength(hole.z, unit) : ''] : []),
      ]);
    }
  }
  return toCsv(inches ? [...FIELDS, ...INCH_FIELDS] : FIELDS, rows);
}
