import type { BorePurpose, PanelBore } from '../layout/bore';
import { line, text, type Shape } from './drawing';
import type { MapView } from './map-view';
import { INK, MUTED, PURPOSE_STYLES } from './palette';
import { fitText } from './text-width';
import type { LengthUnit } from '../units/length-unit';
import { drawingLength, lengthText } from './units';

/** Bores that are drilled alike: one setting of bit, depth stop and face. */
export interface BoreGroup {
  purpose: BorePurpose;
  where: string;
  diameter: number;
  depth: string;
  count: number;
  /** The fittings these bores are for, by name; none for loose bores. */
  fittings: string[];
}

/** A bit's diameter or depth stop: always mm, as the 32 mm system's bits are sold; said so on a sheet in inches, so that no one reads 35 as inches. */
function bitText(mm: number, unit: LengthUnit): string {
  return unit === 'mm' ? lengthText(mm) : `${lengthText(mm)} mm`;
}

/** Where a bore is drilled from, as the bench reads it: `face A`, or `edge x0, 9 from face A` (`11/32"` for inches). */
function boreWhere(bore: PanelBore, unit: LengthUnit): string {
  return bore.kind === 'face' ? `face ${bore.face}` : `edge ${bore.edge}, ${drawingLength(bore.z, unit)} from face A`;
}

/**
 * The bores of a map gathered by how they are drilled (purpose, face or edge, diameter, depth), largest
 * bit first: the list a bench hand sets the machine from. `fittingName` names the fitting of a placement.
 * Bits and depth stops stay in mm, as the 32 mm system's bits are sold; the edge position follows `unit`.
 */
export function boreGroups(view: MapView, fittingName: (placementId: string) => string, unit: LengthUnit): BoreGroup[] {
  const groups = new Map<string, BoreGroup>();
  for (const bore of [...view.faceBores, ...view.edgeBores]) {
    const depth = bore.kind === 'face' && bore.through ? 'THRU' : bitText(bore.depth, unit);
    const where = boreWhere(bore, unit);
    const key = [bore.purpose, where, bore.diameter, depth].join('\n');
    const group = groups.get(key) ?? { purpose: bore.purpose, where, diameter: bore.diameter, depth, count: 0, fittings: [] };
    groups.set(key, group);
    group.count++;
    const fitting = bore.placement === undefined ? undefined : fittingName(bore.placement);
    if (fitting !== undefined && !group.fittings.includes(fitting)) group.fittings.push(fitting);
  }
  return [...groups.values()].sort((a, b) => b.diameter - a.diameter || a.where.localeCompare(b.where) || a.purpose.localeCompare(b.purpose));
}

const SIZE = 2.8;
const ROW = 5;
const COLUMNS = [
  { title: 'Key', width: 9 },
  { title: 'Ø', width: 11 },
  { title: 'Depth', width: 13 },
  { title: 'Drilled from', width: 46 },
  { title: 'Count', width: 13 },
  { title: 'For', width: 68 },
] as const;

const BORE_TABLE_WIDTH = COLUMNS.reduce((sum, c) => sum + c.width, 0);

/** The bore table drawn from its top left corner: a heading, a header row and a row per group. */
export function boreTable(groups: readonly BoreGroup[], unit: LengthUnit): { shapes: Shape[]; width: number; height: number } {
  const rule = { color: MUTED, width: 0.15 };
  const shapes: Shape[] = [text(0, 4, 'Bore table: bores drilled alike', 3.5, INK)];
  let y = 7;
  const row = (cells: string[], colors: string[]) => {
    let x = 0;
    cells.forEach((cell, i) => {
      shapes.push(text(x + 1, y + ROW - 1.4, fitText(cell, SIZE, COLUMNS[i].width - 2), SIZE, colors[i] ?? INK));
      x += COLUMNS[i].width;
    });
    y += ROW;
    shapes.push(line(0, y, BORE_TABLE_WIDTH, y, rule));
  };
  shapes.push(line(0, y, BORE_TABLE_WIDTH, y, rule));
  row(
    COLUMNS.map((c) => c.title),
    COLUMNS.map(() => MUTED),
  );
  for (const g of groups) {
    const { letter, color, label } = PURPOSE_STYLES[g.purpose];
    const what = g.fittings.length === 0 ? label : `${label}: ${g.fittings.join(', ')}`;
    row([letter, bitText(g.diameter, unit), g.depth, g.where, String(g.count), what], [color]);
  }
  if (groups.length === 0) row(['', '', '', 'no bores on this map', '', ''], []);
  return { shapes, width: BORE_TABLE_WIDTH, height: y };
}
