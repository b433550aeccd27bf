import type { FittingPurpose } from '../catalog/fitting';
import { toCsv } from './csv';
import type { ExportContext } from './export-context';
import { PURPOSE_ORDER, PURPOSE_STYLES } from './palette';

/** How many of one fitting a job uses, per carcass and in total. */
export interface HardwareLine {
  fitting: string;
  name: string;
  /** Undefined for a fitting the catalog does not know. */
  purpose?: FittingPurpose;
  /** In the order of `HardwareList.carcasses`. */
  perCarcass: number[];
  total: number;
}

export interface HardwareList {
  /** Column headings: the job's carcasses, then `no carcass` when some panel belongs to none. */
  carcasses: string[];
  lines: HardwareLine[];
}

/**
 * The hardware list: every fitting placed in the job, counted per carcass and in total, grouped by
 * purpose and then by name. A placement counts once, whatever number of bores it drills.
 */
export function hardwareList(ctx: ExportContext): HardwareList {
  const { job, catalog } = ctx;
  const columns = new Map(job.carcasses.map((c, i) => [c.id, i]));
  const loose = job.panels.some((p) => p.placements.length > 0 && (p.carcass === undefined || !columns.has(p.carcass)));
  const names = job.carcasses.map((c) => (job.carcasses.filter((o) => o.name === c.name).length > 1 ? `${c.name} (${c.id})` : c.name));
  const carcasses = loose ? [...names, 'no carcass'] : names;
  const lines = new Map<string, HardwareLine>();
  for (const panel of job.panels) {
    const column = (panel.carcass !== undefined ? columns.get(panel.carcass) : undefined) ?? carcasses.length - 1;
    for (const placement of panel.placements) {
      const fitting = catalog.get(placement.fitting);
      let line = lines.get(placement.fitting);
      if (!line) {
        line = { fitting: placement.fitting, name: fitting?.name ?? `${placement.fitting} (not in the catalog)`, perCarcass: carcasses.map(() => 0), total: 0 };
        if (fitting) line.purpose = fitting.purpose;
        lines.set(placement.fitting, line);
      }
      line.perCarcass[column]++;
      line.total++;
    }
  }
  const rank = (l: HardwareLine) => (l.purpose === undefined ? PURPOSE_ORDER.length : PURPOSE_ORDER.indexOf(l.purpose));
  return { carcasses, lines: [...lines.values()].sort((a, b) => rank(a) - rank(b) || a.name.localeCompare(b.name)) };
}

/** The hardware list as CSV: a row per fitting, a column per carcass, and the total. */
export function hardwareListCsv(list: HardwareList): string {
  const rows = list.lines.map((l) => [l.fitting, l.name, l.purpose === undefined ? 'unknown' : PURPOSE_STYLES[l.purpose].label, ...l.perCarcass, l.total]);
  return toCsv(['fitting', 'name', 'purpose', ...list.carcasses, 'total'], rows);
}
