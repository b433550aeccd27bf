import type { Catalog, FittingPurpose } from '../catalog/fitting';
import type { JobDocument, Panel } from '../model/job-document';
import { toCsv } from './csv';
import type { ExportContext } from './export-context';
import { PURPOSE_ORDER, PURPOSE_STYLES } from './palette';
import type { PanelDrilling } from './panel-drilling';

/**
 * Shelf pins bought per adjustable shelf: two under each end (trade-reference §8a, common practice). The
 * rows of a side hold many more holes than pins, so pins are never counted by the hole.
 */
export const PINS_PER_SHELF = 4;

/** How many of one fitting a job buys, per carcass and in total, and the holes drilled for it, apart. */
export interface HardwareLine {
  fitting: string;
  name: string;
  /** Undefined for a fitting the catalog does not know. */
  purpose?: FittingPurpose;
  /** What is bought, in the order of `HardwareList.carcasses`. */
  perCarcass: number[];
  total: number;
  /** Holes drilled for it (each once, whoever needs it), in the same order, and in total. */
  holesPerCarcass: number[];
  holes: number;
  /** How the quantity is counted: `one per placement`, or shelf pins by the shelf. */
  countedAs: string;
  /** What the bench should know of this line, in plain words: `34 holes drilled for pins; 8 pins for 2 shelves`. */
  note: string;
}

export interface HardwareList {
  /** Column headings: the job's carcasses, then `no carcass` when some panel belongs to none. */
  carcasses: string[];
  lines: HardwareLine[];
  /** What the lines cannot say: shelves with no pin to count for them. */
  notes: string[];
}

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;
const shelvesText = (n: number) => `${n} shel${n === 1 ? 'f' : 'ves'}`;

/**
 * A shelf that rests on pins: a shelf panel joined by no construction fitting of its own. Fixed shelves
 * are joined like a top or bottom (shelf placements of cams or dowels, shared/planner/shelves-plan.ts);
 * adjustable ones lie loose on four pins.
 */
function isAdjustableShelf(panel: Panel, catalog: Catalog): boolean {
  return panel.role === 'shelf' && !panel.placements.some((p) => catalog.get(p.fitting)?.purpose === 'construction');
}

/** The column of a panel: its carcass's, or the last (`no carcass`) for a panel in none. */
function columnsOf(job: JobDocument): { carcasses: string[]; column: (panel: Panel) => number } {
  const columns = new Map(job.carcasses.map((c, i) => [c.id, i]));
  const loose = job.panels.some((p) => (p.placements.length > 0 || p.role === 'shelf') && (p.carcass === undefined || !columns.has(p.carcass)));
  const names = job.carcasses.map((c) => (job.carcasses.filter((o) => o.name === c.name).length > 1 ? `${c.name} (${c.id})` : c.name));
  const carcasses = loose ? [...names, 'no carcass'] : names;
  return { carcasses, column: (panel) => (panel.carcass !== undefined ? columns.get(panel.carcass) : undefined) ?? carcasses.length - 1 };
}

/**
 * The hardware list: what the shop fetches from stores for the job, per carcass and in total, grouped by
 * purpose and then by name, with the holes drilled for each fitting shown apart. Hinges, plates, lift
 * mechanisms, runners, connectors and dowels count one per placement. Shelf pins count four per adjustable
 * shelf of the carcass, whatever number of holes its sides have; shelves in no carcass have no sides to
 * drill and their pins are not counted, which the line says.
 */
export function hardwareList(ctx: ExportContext, drilling: readonly PanelDrilling[]): HardwareList {
  const { job, catalog } = ctx;
  const { carcasses, column } = columnsOf(job);
  const zeros = () => carcasses.map(() => 0);
  const lines = new Map<string, HardwareLine>();
  const lineOf = (fittingId: string) => {
    let line = lines.get(fittingId);
    if (!line) {
      const fitting = catalog.get(fittingId);
      line = { fitting: fittingId, name: fitting?.name ?? `${fittingId} (not in the catalog)`, perCarcass: zeros(), total: 0, holesPerCarcass: zeros(), holes: 0, countedAs: 'one per placement', note: '' };
      if (fitting) line.purpose = fitting.purpose;
      lines.set(fittingId, line);
    }
    return line;
  };
  const placements = new Map<string, number[]>();
  for (const { panel, holes } of drilling) {
    const col = column(panel);
    const fittingOf = new Map(panel.placements.map((p) => [p.id, p.fitting]));
    for (const placement of panel.placements) {
      lineOf(placement.fitting);
      const counts = placements.get(placement.fitting) ?? zeros();
      counts[col]++;
      placements.set(placement.fitting, counts);
    }
    for (const hole of holes) {
      const fitting = hole.placement === undefined ? undefined : fittingOf.get(hole.placement);
      if (fitting === undefined) continue;
      const line = lineOf(fitting);
      line.holesPerCarcass[col]++;
      line.holes++;
    }
  }
  const shelves = zeros();
  for (const panel of job.panels) if (isAdjustableShelf(panel, catalog)) shelves[column(panel)]++;
  const looseColumn = carcasses.length > job.carcasses.length ? carcasses.length - 1 : -1;
  // A carcass's shelves rest on the pin its sides are drilled for: the pin placed most in it, when a job mixes two.
  const pinLines = [...lines.values()].filter((l) => l.purpose === 'shelf-pin');
  const pinOf = carcasses.map((_, col) => pinLines.reduce<HardwareLine | undefined>((best, l) => ((placements.get(l.fitting)?.[col] ?? 0) > (best ? (placements.get(best.fitting)?.[col] ?? 0) : 0) ? l : best), undefined));
  for (const line of lines.values()) {
    if (line.purpose === 'shelf-pin') {
      line.countedAs = `${PINS_PER_SHELF} per adjustable shelf`;
      line.perCarcass = shelves.map((n, col) => (col !== looseColumn && pinOf[col] === line ? PINS_PER_SHELF * n : 0));
      const counted = line.perCarcass.reduce((a, b) => a + b, 0) / PINS_PER_SHELF;
      const parts = [`${plural(line.holes, 'hole')} drilled for pins; ${plural(PINS_PER_SHELF * counted, 'pin')} for ${shelvesText(counted)}`];
      if (looseColumn >= 0 && shelves[looseColumn] > 0) parts.push(`${shelvesText(shelves[looseColumn])} in no carcass: pins not counted, ${PINS_PER_SHELF} each if they rest on pins`);
      line.note = parts.join('; ');
    } else {
      line.perCarcass = placements.get(line.fitting) ?? zeros();
      line.note = `${plural(line.holes, 'hole')} drilled`;
    }
    line.total = line.perCarcass.reduce((a, b) => a + b, 0);
  }
  const notes = shelves.flatMap((n, col) => {
    if (n === 0) return [];
    if (col === looseColumn) return [`${shelvesText(n)} in no carcass: their pins are not counted (${PINS_PER_SHELF} each if they rest on pins).`];
    return pinOf[col] ? [] : [`${carcasses[col]}: ${shelvesText(n)} to rest on pins, but no shelf-pin holes are placed: no pins counted.`];
  });
  const rank = (l: HardwareLine) => (l.purpose === undefined ? PURPOSE_ORDER.length : PURPOSE_ORDER.indexOf(l.purpose));
  return { carcasses, lines: [...lines.values()].sort((a, b) => rank(a) - rank(b) || a.name.localeCompare(b.name)), notes };
}

/** The hardware list as CSV: a row per fitting, a column per carcass, the total to buy, how it is counted, the holes drilled and a note. */
export function hardwareListCsv(list: HardwareList): string {
  const rows = list.lines.map((l) => [l.fitting, l.name, l.purpose === undefined ? 'unknown' : PURPOSE_STYLES[l.purpose].label, ...l.perCarcass, l.total, l.countedAs, l.holes, l.note]);
  return toCsv(['fitting', 'name', 'purpose', ...list.carcasses, 'total to buy', 'counted as', 'holes drilled', 'note'], rows);
}
