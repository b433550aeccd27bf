import type { PanelBore } from '../layout/bore';
import type { Panel } from '../model/job-document';
import { toCsv } from './csv';
import { carcassName, fittingNameOf, type ExportContext } from './export-context';
import { PURPOSE_STYLES } from './palette';
import type { PanelDrilling } from './panel-drilling';
import { roundTo } from './units';

const FIELDS = ['carcass', 'panel', 'panel name', 'bore', 'face or edge', 'x', 'y', 'z from face A', 'diameter', 'depth', 'through', 'fitting', 'purpose'];

const n = (value: number) => roundTo(value, 0.0001);

/** Where a bore enters the panel, in its frame: a face bore's centre, an edge bore's point on its edge. */
function entry(bore: PanelBore, panel: Panel): [number, number] {
  if (bore.kind === 'face') return [bore.x, bore.y];
  return { x0: [0, bore.at], x1: [panel.width, bore.at], y0: [bore.at, 0], y1: [bore.at, panel.height] }[bore.edge] as [number, number];
}

/**
 * The hole schedule as CSV: a row per bore of every panel, in the document's order, in the panel's frame
 * seen from face A (mm). An edge bore's x and y are where it enters its edge; z is its height from face A.
 */
export function holeScheduleCsv(ctx: ExportContext, drilling: readonly PanelDrilling[]): string {
  const rows: (string | number)[][] = [];
  for (const { panel, bores } of drilling) {
    const fittingName = fittingNameOf(ctx, panel);
    const carcass = carcassName(ctx, panel);
    for (const bore of bores) {
      const [x, y] = entry(bore, panel);
      rows.push([
        carcass,
        panel.id,
        panel.name,
        bore.id,
        bore.kind === 'face' ? bore.face : `edge ${bore.edge}`,
        n(x),
        n(y),
        bore.kind === 'edge' ? n(bore.z) : '',
        n(bore.diameter),
        n(bore.depth),
        bore.kind === 'face' && bore.through ? 'yes' : 'no',
        bore.placement === undefined ? '' : fittingName(bore.placement),
        PURPOSE_STYLES[bore.purpose].label,
      ]);
    }
  }
  return toCsv(FIELDS, rows);
}
