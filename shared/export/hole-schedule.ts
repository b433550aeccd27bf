import type { Panel } from '../model/job-document';
import { toCsv } from './csv';
import { carcassName, fittingNameOf, type ExportContext } from './export-context';
import { PURPOSE_STYLES } from './palette';
import type { PanelDrilling } from './panel-drilling';
import type { PanelHole } from './panel-holes';
import { roundTo } from './units';

const FIELDS = ['carcass', 'panel', 'panel name', 'hole', 'face or edge', 'x', 'y', 'z from face A', 'diameter', 'depth', 'through', 'fitting', 'purpose', 'bores'];

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
 * names the document's bores the hole drills.
 */
export function holeScheduleCsv(ctx: ExportContext, drilling: readonly PanelDrilling[]): string {
  const rows: (string | number)[][] = [];
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
      ]);
    }
  }
  return toCsv(FIELDS, rows);
}
